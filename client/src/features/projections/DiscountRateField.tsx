import { useId } from 'react';
import { rangeText } from '../../../../shared/scenario/parameters';
import { formatNumber } from '../../shared/lib/parameterDraft';
import { discountInPercent } from './scenarioDraft';

/**
 * The discount rate, typed in % per year. Laid out like the shared parameter field
 * (meaning, range and default beside the input), which shows catalogue units only.
 */
export function DiscountRateField({
  value,
  onChange,
  error,
}: {
  value: string;
  onChange: (text: string) => void;
  error?: string;
}) {
  const id = useId();
  const p = discountInPercent;
  const describedBy = `${id}-meaning ${id}-range${error ? ` ${id}-error` : ''}`;
  return (
    <div className="grid gap-x-6 gap-y-2 border-t border-silt-200 py-4 first:border-t-0 first:pt-0 md:grid-cols-[minmax(0,1fr)_15rem]">
      <div className="flex flex-col gap-1">
        <label htmlFor={id} className="font-medium text-humus-900">
          {p.label}
        </label>
        <p id={`${id}-meaning`} className="text-sm text-loam-700">
          {p.meaning}
        </p>
        <p id={`${id}-range`} className="text-sm text-loam-700">
          <span className="font-medium text-humus-900">Valid</span> {rangeText(p)} ·{' '}
          <span className="font-medium text-humus-900">
            default {formatNumber(p.default ?? 0)}
            {p.defaultSource === 'illustrative' ? ' (illustrative)' : ''}
          </span>
        </p>
      </div>
      <div className="flex flex-col gap-2">
        <div
          className={`flex items-stretch overflow-hidden rounded-seed border bg-white focus-within:border-humus-900 focus-within:outline-3 focus-within:outline-offset-2 focus-within:outline-clay-600 ${
            error ? 'border-danger-700 ring-1 ring-danger-700' : 'border-loam-400 hover:border-loam-600'
          }`}
        >
          <input
            id={id}
            name="discountRate"
            type="text"
            inputMode="decimal"
            autoComplete="off"
            value={value}
            onChange={(event) => onChange(event.target.value)}
            aria-invalid={error !== undefined}
            aria-describedby={describedBy}
            className="min-h-11 w-full min-w-0 bg-transparent px-3 py-2 text-right text-base tabular-nums focus-visible:outline-none"
          />
          <span className="flex shrink-0 items-center border-l border-silt-300 bg-silt-100 px-2 text-xs text-loam-700">
            {p.unit}
          </span>
        </div>
        {error ? (
          <p id={`${id}-error`} className="flex items-start gap-1.5 text-sm font-medium text-danger-700">
            <span aria-hidden="true">✕</span>
            <span>{error}</span>
          </p>
        ) : null}
      </div>
    </div>
  );
}
