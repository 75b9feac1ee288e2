import type { ReactNode } from 'react';

/** One number the lesson states, large enough to read from the back of a room in projector mode. */
export function Figure({
  label,
  value,
  note,
  large,
}: {
  label: string;
  value: ReactNode;
  note?: ReactNode;
  large: boolean;
}) {
  return (
    <div className="flex flex-col gap-0.5 rounded-seed border border-silt-300 bg-silt-50 px-4 py-3 break-inside-avoid">
      <dt className={`font-medium text-loam-700 ${large ? 'text-xl' : 'text-sm'}`}>{label}</dt>
      <dd
        className={`font-display font-semibold text-humus-900 tabular-nums ${large ? 'text-4xl' : 'text-3xl'}`}
      >
        {value}
      </dd>
      {note ? <dd className={`text-loam-700 ${large ? 'text-lg' : 'text-sm'}`}>{note}</dd> : null}
    </div>
  );
}

export const years = (t: number | null, horizon: number) =>
  t === null
    ? `more than ${horizon} years`
    : `${t.toLocaleString('en-US', { maximumFractionDigits: 1 })} years`;
