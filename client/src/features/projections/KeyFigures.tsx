import type { ReactNode } from 'react';

/** A row of headline numbers, each with what it is and its unit. */
export function KeyFigures({
  items,
}: {
  items: { label: string; value: ReactNode; unit?: string; note?: ReactNode }[];
}) {
  return (
    <dl className="grid gap-px overflow-hidden rounded-seed border border-silt-300 bg-silt-300 shadow-sheet sm:grid-cols-2 lg:grid-cols-4">
      {items.map((item) => (
        <div key={item.label} className="flex flex-col gap-1 bg-white px-5 py-4">
          <dt className="text-sm text-loam-700">{item.label}</dt>
          <dd className="flex flex-col">
            <span className="font-display text-3xl font-semibold text-humus-900">
              {item.value}
              {item.unit ? (
                <span className="ml-1.5 font-sans text-base font-normal text-loam-700">{item.unit}</span>
              ) : null}
            </span>
            {item.note ? <span className="text-xs text-loam-700">{item.note}</span> : null}
          </dd>
        </div>
      ))}
    </dl>
  );
}
