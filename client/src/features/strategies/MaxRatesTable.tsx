import { Button } from '../../shared/components/Button';
import { newKey, type MaxRateDraft } from './strategyDraft';

type MaxRatesTableProps = {
  rates: readonly MaxRateDraft[];
  editable: boolean;
  errorAt: (path: string) => string | undefined;
  onChange: (path: string, change: (rates: MaxRateDraft[]) => MaxRateDraft[]) => void;
  /** The crop of the strategy's field, offered for a new row. */
  crop: string | null;
};

const columns: { key: keyof Omit<MaxRateDraft, 'key'>; label: string; numeric?: boolean }[] = [
  { key: 'activeIngredient', label: 'Active ingredient' },
  { key: 'crop', label: 'Crop' },
  { key: 'maxRate', label: 'Maximum rate', numeric: true },
  { key: 'rateUnit', label: 'Rate unit' },
];

/**
 * Maximum rates the person copied from product labels, per crop. Seedwake has none of its
 * own: it only compares the steps' entered rates with these and warns when one is higher.
 */
export function MaxRatesTable({ rates, editable, errorAt, onChange, crop }: MaxRatesTableProps) {
  const set = (key: string, column: keyof Omit<MaxRateDraft, 'key'>, value: string) =>
    onChange(`maxRates.${key}.${column}`, (rows) =>
      rows.map((r) => (r.key === key ? { ...r, [column]: value } : r)),
    );

  if (!editable && rates.length === 0) {
    return <p className="text-loam-700">No maximum rates recorded.</p>;
  }
  return (
    <div className="flex flex-col gap-3">
      <div className="overflow-x-auto">
        <table className="w-full min-w-[36rem] text-left text-sm">
          <caption className="sr-only">Maximum rates recorded from product labels</caption>
          <thead className="text-loam-700">
            <tr>
              {columns.map((c) => (
                <th key={c.key} scope="col" className="py-2 pr-3 font-semibold">
                  {c.label}
                </th>
              ))}
              {editable ? (
                <th scope="col" className="py-2">
                  <span className="sr-only">Remove</span>
                </th>
              ) : null}
            </tr>
          </thead>
          <tbody>
            {rates.length === 0 ? (
              <tr>
                <td colSpan={5} className="py-3 text-loam-700">
                  None yet. Add the maximum rate from a label to be warned when a step’s rate is higher.
                </td>
              </tr>
            ) : null}
            {rates.map((rate, i) => (
              <tr key={rate.key} className="border-t border-silt-200 align-top">
                {columns.map((c) => {
                  const error = errorAt(`maxRates.${rate.key}.${c.key}`);
                  const errorId = `rate-${rate.key}-${c.key}-error`;
                  return (
                    <td key={c.key} className="py-2 pr-3">
                      {editable ? (
                        <>
                          <input
                            type="text"
                            inputMode={c.numeric ? 'decimal' : undefined}
                            aria-label={`${c.label}, row ${i + 1}`}
                            value={rate[c.key]}
                            onChange={(event) => set(rate.key, c.key, event.target.value)}
                            aria-invalid={error !== undefined}
                            aria-describedby={error ? errorId : undefined}
                            className={`min-h-9 w-full rounded-seed border bg-white px-2 py-1 ${c.numeric ? 'text-right' : ''} ${
                              error ? 'border-danger-700 ring-1 ring-danger-700' : 'border-loam-400'
                            }`}
                          />
                          {error ? (
                            <p id={errorId} className="mt-1 text-xs font-medium text-danger-700">
                              {error}
                            </p>
                          ) : null}
                        </>
                      ) : (
                        <span className={c.numeric ? 'block text-right' : ''}>{rate[c.key]}</span>
                      )}
                    </td>
                  );
                })}
                {editable ? (
                  <td className="py-2 text-right">
                    <Button
                      variant="quiet"
                      size="sm"
                      onClick={() => onChange('maxRates', (rows) => rows.filter((r) => r.key !== rate.key))}
                    >
                      Remove<span className="sr-only"> row {i + 1}</span>
                    </Button>
                  </td>
                ) : null}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {editable ? (
        <Button
          variant="secondary"
          size="sm"
          className="self-start"
          onClick={() =>
            onChange('maxRates', (rows) => [
              ...rows,
              { key: newKey('r'), activeIngredient: '', crop: crop ?? '', maxRate: '', rateUnit: '' },
            ])
          }
        >
          Add a maximum rate
        </Button>
      ) : null}
    </div>
  );
}
