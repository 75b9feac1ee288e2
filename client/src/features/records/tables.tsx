import type { ReactNode } from 'react';

/* Table cell styles shared by the records tables: numbers right-aligned in tabular figures. */
export const th = 'px-3 py-2 text-right align-bottom font-semibold';
export const thLeft = 'py-2 pr-3 text-left align-bottom font-semibold';
export const td = 'px-3 py-2 text-right align-top tabular-nums';
export const tdLeft = 'py-2 pr-3 text-left align-top';

/** A table that scrolls sideways on a narrow screen, reachable by keyboard. */
export function TableScroll({ label, children }: { label: string; children: ReactNode }) {
  return (
    <div className="overflow-x-auto" tabIndex={0} role="region" aria-label={`${label}, scrolls sideways`}>
      {children}
    </div>
  );
}
