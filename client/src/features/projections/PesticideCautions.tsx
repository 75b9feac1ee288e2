import { pesticideCautions } from '../../../../shared/scenario/cautions';

/** Shown wherever a projection with a chemical step is reported. */
export function PesticideCautions({ strategies }: { strategies?: readonly string[] }) {
  return (
    <aside
      aria-labelledby="pesticide-cautions"
      className="rounded-seed border border-clay-500 border-l-4 bg-clay-100/60 px-4 py-3 text-sm text-humus-900 break-inside-avoid"
    >
      <h2 id="pesticide-cautions" className="font-sans text-base font-semibold">
        Pesticide cautions
      </h2>
      {strategies && strategies.length > 0 ? (
        <p className="mt-1 text-loam-700">Chemical steps are planned in: {strategies.join('; ')}.</p>
      ) : null}
      <ul className="mt-2 flex list-disc flex-col gap-1 pl-5">
        {pesticideCautions.map((line) => (
          <li key={line}>{line}</li>
        ))}
      </ul>
    </aside>
  );
}
