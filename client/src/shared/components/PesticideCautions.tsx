import { pesticideCautions } from '../../../../shared/scenario/cautions';

/** The pesticide cautions, shown wherever a chemical step is planned or reported. */
export function PesticideCautions({ className = '' }: { className?: string }) {
  return (
    <aside
      aria-label="Pesticide cautions"
      className={`rounded-seed border border-clay-500 bg-clay-100 px-4 py-3 text-sm text-humus-900 ${className}`}
    >
      <p className="font-semibold">Pesticide cautions</p>
      <ul className="mt-1 list-disc pl-5">
        {pesticideCautions.map((caution) => (
          <li key={caution}>{caution}</li>
        ))}
      </ul>
    </aside>
  );
}
