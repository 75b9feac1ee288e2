import { formatPercent } from './display';
import { groupElasticities, transitionGroups } from './elasticity';
import type { MatrixView } from './result';

function lambdaSentence(lambda: number): string {
  const change = Math.abs(lambda - 1) * 100;
  if (Math.abs(lambda - 1) < 0.005) {
    return 'λ ≈ 1: under this program the population holds steady in the long run.';
  }
  if (lambda < 1) {
    return `λ < 1: the program drives the population down, by about ${change.toFixed(0)} % a year in the long run.`;
  }
  return `λ > 1: under this program the population still grows, by about ${change.toFixed(0)} % a year in the long run.`;
}

/**
 * λ and "which stage to hit" for one projection's program, from the matrix view (the
 * year-1 program repeated, without crowding or immigrant seed).
 */
export function ElasticityPanel({ matrix }: { matrix: MatrixView }) {
  if (!matrix.ok) {
    return (
      <section
        aria-labelledby="elasticity-title"
        className="flex flex-col gap-2 rounded-seed border border-silt-300 bg-white p-5 shadow-sheet"
      >
        <h2 id="elasticity-title" className="text-2xl font-semibold">
          Which stage to hit
        </h2>
        <p className="text-loam-700">The matrix view is not defined for this program: {matrix.reason}</p>
      </section>
    );
  }
  const groups = groupElasticities(matrix.stages, matrix.elasticities);
  const top = groups[0];
  return (
    <section
      aria-labelledby="elasticity-title"
      className="flex flex-col gap-4 rounded-seed border border-silt-300 bg-white p-5 shadow-sheet break-inside-avoid"
    >
      <div className="flex flex-wrap items-baseline justify-between gap-3">
        <h2 id="elasticity-title" className="text-2xl font-semibold">
          Which stage to hit
        </h2>
        <p className="font-display text-2xl font-semibold">
          λ = {matrix.lambda.toFixed(3)}{' '}
          <span className="font-sans text-base font-normal text-loam-700">per year</span>
        </p>
      </div>
      <p className="max-w-prose text-humus-900">{lambdaSentence(matrix.lambda)}</p>
      <p className="max-w-prose text-sm text-loam-700">
        λ is the long-run yearly multiplication rate of the population when this program is repeated every
        year as it is in year 1, with crowding and immigrant seed left out. The shares below are the matrix
        elasticities summed by kind of transition: each says how much of λ rests on that part of the life
        cycle. Cutting every transition of a kind by 10 % lowers λ by about its share of that 10 %.
      </p>
      <ul className="flex flex-col gap-3">
        {groups.map(({ group, share }) => (
          <li
            key={group}
            className="grid gap-1 sm:grid-cols-[14rem_minmax(0,1fr)_4rem] sm:items-center sm:gap-4"
          >
            <span className="font-medium text-humus-900">{transitionGroups[group].name}</span>
            <span className="flex flex-col gap-1">
              <span className="h-3 overflow-hidden rounded-full bg-silt-200" aria-hidden="true">
                <span
                  className="block h-full rounded-full bg-russet-600"
                  style={{ width: `${Math.max(0, share) * 100}%` }}
                />
              </span>
              <span className="text-xs text-loam-700">{transitionGroups[group].explanation}</span>
            </span>
            <span className="text-right font-semibold text-humus-900 sm:text-left">
              {formatPercent(share)}
            </span>
          </li>
        ))}
      </ul>
      {top ? (
        <p className="max-w-prose rounded-seed bg-silt-100 px-4 py-3 text-humus-900">
          <strong>{transitionGroups[top.group].name}</strong> carries the largest share (
          {formatPercent(top.share)}): steps that cut it move λ the most. A 10 % cut there lowers λ by about{' '}
          {(top.share * 10).toFixed(1)} %.
        </p>
      ) : null}
    </section>
  );
}
