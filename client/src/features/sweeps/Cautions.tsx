import { pesticideCautions } from '../../../../shared/scenario/cautions';

/** Shown wherever a sweep's strategy has a chemical step, planned or reported. */
export function Cautions() {
  return (
    <aside
      aria-labelledby="sweep-pesticide-cautions"
      className="rounded-seed border border-l-4 border-clay-500 bg-clay-100/60 px-4 py-3 text-sm text-humus-900 break-inside-avoid"
    >
      <h2 id="sweep-pesticide-cautions" className="font-sans text-base font-semibold">
        Pesticide cautions
      </h2>
      <ul className="mt-2 flex list-disc flex-col gap-1 pl-5">
        {pesticideCautions.map((line) => (
          <li key={line}>{line}</li>
        ))}
      </ul>
    </aside>
  );
}
