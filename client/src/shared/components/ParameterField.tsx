import { useId, type ReactNode } from 'react';
import { parameterCatalogue, rangeText, type ParameterKey } from '../../../../shared/scenario/parameters';
import { formatNumber, shownParameter, shownText, typedDraft, type NumberDraft } from '../lib/parameterDraft';
import { useUnits } from '../lib/units';

type SourceNote = { value: string; onChange: (value: string) => void; error?: string };

type ParameterFieldProps = {
  parameter: ParameterKey;
  draft: NumberDraft;
  onChange: (draft: NumberDraft) => void;
  /** Replaces the catalogue label, e.g. "Age class 2" inside a list. */
  label?: string;
  /** Replaces the catalogue meaning where a step kind gives the value a narrower sense. */
  meaning?: ReactNode;
  error?: string;
  optional?: boolean;
  /** The person's own note on where the value came from ("from our 2025 soil cores"). */
  source?: SourceNote;
  /** Shows the value as text, with its meaning, range and default, but no input. */
  readOnly?: boolean;
  /** A source note recorded with a read-only value. */
  readOnlySource?: string;
  /** Shown in place of the catalogue unit where the person names it (a rate's unit from the label). */
  unit?: string;
};

/**
 * One numeric parameter with everything a person needs to judge it beside the input:
 * what it means, its unit, the valid range and the default with where it came from, all
 * from the parameter catalogue and converted to the chosen unit system.
 */
export function ParameterField({
  parameter,
  draft,
  onChange,
  label,
  meaning,
  error,
  optional = false,
  source,
  readOnly = false,
  readOnlySource,
  unit,
}: ParameterFieldProps) {
  const id = useId();
  const { system } = useUnits();
  const p = parameterCatalogue[parameter];
  const converted = shownParameter(p, system);
  const shown = unit ? { ...converted, unit } : converted;
  const text = shownText(parameter, draft, system);
  // The catalogue words its meanings in metric; in US units they speak of ft² and acres.
  const said =
    converted.unit === p.unit
      ? p.meaning
      : p.meaning.replace(/\bm²/g, 'ft²').replace(/\bper ha\b/g, 'per acre');
  const meaningId = `${id}-meaning`;
  const rangeId = `${id}-range`;
  const errorId = `${id}-error`;
  const invalid = error !== undefined;
  const defaultText =
    shown.default === null
      ? 'no default'
      : // A converted default is rounded to four significant figures; a metric one is shown as catalogued.
        `default ${formatNumber(converted === p ? shown.default : Number(shown.default.toPrecision(4)), 6)}${
          p.defaultSource === 'illustrative' ? ' (illustrative)' : ''
        }`;

  return (
    <div className="grid gap-x-6 gap-y-2 border-t border-silt-200 py-4 first:border-t-0 first:pt-0 md:grid-cols-[minmax(0,1fr)_15rem]">
      <div className="flex flex-col gap-1">
        {readOnly ? (
          <p className="font-medium text-humus-900" id={`${id}-label`}>
            {label ?? p.label}
          </p>
        ) : (
          <label htmlFor={id} className="font-medium text-humus-900">
            {label ?? p.label}
            {optional ? <span className="font-normal text-loam-600"> (optional)</span> : null}
          </label>
        )}
        <p id={meaningId} className="text-sm text-loam-700">
          {meaning ?? said}
        </p>
        <p id={rangeId} className="text-sm text-loam-700">
          <span className="font-medium text-humus-900">Valid</span> {rangeText(shown)} ·{' '}
          <span className="font-medium text-humus-900">{defaultText}</span>
          {p.defaultSource !== 'illustrative' ? (
            <span className="block text-xs text-loam-600">
              {p.default === null
                ? `No default: ${p.defaultSource.replace(/^none:\s*/, '')}`
                : `Default from ${p.defaultSource}`}
            </span>
          ) : null}
        </p>
        {'note' in p && p.note ? <p className="text-xs text-loam-600">{p.note}</p> : null}
      </div>
      <div className="flex flex-col gap-2">
        {readOnly ? (
          <p
            className="flex min-h-11 items-center justify-between rounded-seed bg-silt-100 px-3 py-2 font-medium"
            aria-labelledby={`${id}-label`}
          >
            <span>{text === '' ? '—' : text}</span>
            <span className="text-sm font-normal text-loam-700">{shown.unit}</span>
          </p>
        ) : (
          <div
            className={`flex items-stretch overflow-hidden rounded-seed border bg-white focus-within:border-humus-900 focus-within:outline-3 focus-within:outline-offset-2 focus-within:outline-clay-600 ${
              invalid ? 'border-danger-700 ring-1 ring-danger-700' : 'border-loam-400 hover:border-loam-600'
            }`}
          >
            <input
              id={id}
              name={parameter}
              type="text"
              inputMode="decimal"
              autoComplete="off"
              value={text}
              onChange={(event) => onChange(typedDraft(event.target.value, system))}
              aria-invalid={invalid}
              aria-describedby={`${meaningId} ${rangeId}${invalid ? ` ${errorId}` : ''}`}
              className="min-h-11 w-full min-w-0 bg-transparent px-3 py-2 text-right text-base tabular-nums focus-visible:outline-none"
            />
            <span className="flex shrink-0 items-center border-l border-silt-300 bg-silt-100 px-2 text-xs text-loam-700">
              {shown.unit}
            </span>
          </div>
        )}
        {error ? (
          <p id={errorId} className="flex items-start gap-1.5 text-sm font-medium text-danger-700">
            <span aria-hidden="true">✕</span>
            <span>{error}</span>
          </p>
        ) : null}
        {source ? (
          <SourceNoteInput label={`Source of “${label ?? p.label}”`} {...source} />
        ) : readOnlySource ? (
          <p className="text-sm text-loam-700">
            <span className="font-medium text-humus-900">Source:</span> {readOnlySource}
          </p>
        ) : null}
      </div>
    </div>
  );
}

/** A one-line note on where a value came from; optional, saved with the profile. */
export function SourceNoteInput({ label, value, onChange, error }: SourceNote & { label: string }) {
  const id = useId();
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="sr-only">
        {label}
      </label>
      <input
        id={id}
        type="text"
        value={value}
        maxLength={500}
        onChange={(event) => onChange(event.target.value)}
        placeholder="Your source, e.g. our 2025 soil cores"
        aria-invalid={error !== undefined}
        aria-describedby={error ? `${id}-error` : undefined}
        className="min-h-9 rounded-seed border border-dashed border-loam-400 bg-silt-50 px-2 py-1 text-sm placeholder:text-loam-600 hover:border-loam-600"
      />
      {error ? (
        <p id={`${id}-error`} className="text-sm font-medium text-danger-700">
          {error}
        </p>
      ) : null}
    </div>
  );
}
