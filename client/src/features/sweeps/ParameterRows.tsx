import { useId, useState } from 'react';
import type { SweepableParameterView } from '../../../../shared/api/sweeps';
import { parameterCatalogue, rangeText, type ParameterKey } from '../../../../shared/scenario/parameters';
import { Button } from '../../shared/components/Button';
import {
  formatNumber,
  shownParameter,
  shownText,
  typedDraft,
  type NumberDraft,
} from '../../shared/lib/parameterDraft';
import { useUnits } from '../../shared/lib/units';
import { startingRange, type ParameterDraft } from './sweepDraft';

type Props = {
  available: readonly SweepableParameterView[];
  rows: readonly ParameterDraft[];
  onChange: (rows: ParameterDraft[]) => void;
  errors: Record<string, string>;
};

const groups = [
  { label: 'Species profile', test: (path: string) => path.startsWith('profile.') },
  { label: 'Field', test: (path: string) => path.startsWith('field.') },
  { label: 'Strategy steps', test: (path: string) => path.startsWith('strategy.') },
];

/**
 * The parameters to vary: chosen from the scenario's own numbers, each shown with its
 * meaning, unit, valid range and value in the scenario, with a min and a max typed in the
 * chosen unit system.
 */
export function ParameterRows({ available, rows, onChange, errors }: Props) {
  const { system } = useUnits();
  const pickId = useId();
  const unused = available.filter((p) => !rows.some((r) => r.path === p.path));
  const [pick, setPick] = useState('');
  const chosen = unused.some((p) => p.path === pick) ? pick : (unused[0]?.path ?? '');
  const byPath = new Map(available.map((p) => [p.path, p]));

  const update = (i: number, bound: 'min' | 'max', draft: NumberDraft) =>
    onChange(rows.map((r, j) => (j === i ? { ...r, [bound]: draft } : r)));

  return (
    <div className="flex flex-col gap-4">
      {rows.length === 0 ? (
        <p className="text-sm text-loam-700">No parameter chosen yet: add the ones you are unsure of.</p>
      ) : (
        <ol className="flex list-none flex-col gap-3">
          {rows.map((row, i) => {
            const p = byPath.get(row.path);
            if (!p) return null;
            const key = p.key as ParameterKey;
            const shown = shownParameter(parameterCatalogue[key], system);
            const base = shownText(key, { text: String(p.base), system: 'metric' }, system);
            return (
              <li key={row.path} className="rounded-seed border border-silt-300 bg-silt-50 p-4">
                <div className="flex flex-wrap items-start justify-between gap-3">
                  <div className="min-w-0 flex-1">
                    <p className="font-medium text-humus-900">{p.label}</p>
                    <p className="text-sm text-loam-700">{p.meaning}</p>
                    <p className="mt-1 text-sm text-loam-700">
                      <span className="font-medium text-humus-900">Valid</span> {rangeText(shown)} ·{' '}
                      <span className="font-medium text-humus-900">In the scenario</span>{' '}
                      {formatNumber(Number(base), 6)} {shown.unit}
                    </p>
                    <p className="font-mono text-xs text-loam-600">{p.path}</p>
                  </div>
                  <Button
                    variant="quiet"
                    size="sm"
                    onClick={() => onChange(rows.filter((_, j) => j !== i))}
                    aria-label={`Remove ${p.label}`}
                  >
                    Remove
                  </Button>
                </div>
                <div className="mt-3 grid gap-3 sm:grid-cols-2">
                  {(['min', 'max'] as const).map((bound) => (
                    <BoundInput
                      key={bound}
                      label={`${bound === 'min' ? 'Lowest' : 'Highest'} value of ${p.label}`}
                      visibleLabel={bound === 'min' ? 'Min' : 'Max'}
                      unit={shown.unit}
                      text={shownText(key, row[bound], system)}
                      onChange={(text) => update(i, bound, typedDraft(text, system))}
                      error={
                        errors[`parameters[${i}].${bound}`] ??
                        (bound === 'min' ? errors[`parameters[${i}]`] : undefined)
                      }
                    />
                  ))}
                </div>
                {errors[`parameters[${i}].path`] ? (
                  <p className="mt-2 text-sm font-medium text-danger-700">
                    {errors[`parameters[${i}].path`]}
                  </p>
                ) : null}
              </li>
            );
          })}
        </ol>
      )}
      {unused.length > 0 ? (
        <div className="flex flex-wrap items-end gap-3">
          <div className="flex min-w-0 flex-1 flex-col gap-1.5">
            <label htmlFor={pickId} className="font-medium text-humus-900">
              Parameter to add
            </label>
            <select
              id={pickId}
              value={chosen}
              onChange={(e) => setPick(e.target.value)}
              className="min-h-11 rounded-seed border border-loam-400 bg-white px-3 py-2 text-base text-humus-900 hover:border-loam-600"
            >
              {groups.map((g) => {
                const items = unused.filter((p) => g.test(p.path));
                if (items.length === 0) return null;
                return (
                  <optgroup key={g.label} label={g.label}>
                    {items.map((p) => (
                      <option key={p.path} value={p.path}>
                        {p.label} ({shownParameter(parameterCatalogue[p.key as ParameterKey], system).unit})
                      </option>
                    ))}
                  </optgroup>
                );
              })}
            </select>
          </div>
          <Button
            variant="secondary"
            onClick={() => {
              const p = byPath.get(chosen);
              if (p) onChange([...rows, startingRange(p)]);
            }}
          >
            Add parameter
          </Button>
        </div>
      ) : null}
      {errors.parameters ? <p className="text-sm font-medium text-danger-700">{errors.parameters}</p> : null}
    </div>
  );
}

function BoundInput({
  label,
  visibleLabel,
  unit,
  text,
  onChange,
  error,
}: {
  label: string;
  visibleLabel: string;
  unit: string;
  text: string;
  onChange: (text: string) => void;
  error?: string;
}) {
  const id = useId();
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-sm font-medium text-humus-900">
        {visibleLabel}
        <span className="sr-only"> — {label}</span>
      </label>
      <div
        className={`flex items-stretch overflow-hidden rounded-seed border bg-white focus-within:border-humus-900 focus-within:outline-3 focus-within:outline-offset-2 focus-within:outline-clay-600 ${
          error ? 'border-danger-700 ring-1 ring-danger-700' : 'border-loam-400 hover:border-loam-600'
        }`}
      >
        <input
          id={id}
          type="text"
          inputMode="decimal"
          autoComplete="off"
          value={text}
          onChange={(e) => onChange(e.target.value)}
          aria-invalid={error !== undefined}
          aria-describedby={error ? `${id}-error` : undefined}
          className="min-h-11 w-full min-w-0 bg-transparent px-3 py-2 text-right text-base tabular-nums focus-visible:outline-none"
        />
        <span className="flex shrink-0 items-center border-l border-silt-300 bg-silt-100 px-2 text-xs text-loam-700">
          {unit}
        </span>
      </div>
      {error ? (
        <p id={`${id}-error`} className="flex items-start gap-1.5 text-sm font-medium text-danger-700">
          <span aria-hidden="true">✕</span>
          <span>{error}</span>
        </p>
      ) : null}
    </div>
  );
}
