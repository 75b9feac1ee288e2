import type { ReactNode } from 'react';

/** A sheet on the page: the surface every form and list sits on. */
export function Panel({ children, className = '' }: { children: ReactNode; className?: string }) {
  return (
    <div className={`rounded-seed border border-silt-300 bg-white p-5 shadow-sheet sm:p-6 ${className}`}>
      {children}
    </div>
  );
}

/** Page title block: an eyebrow naming where you are, the title, and an optional lead. */
export function PageTitle({ eyebrow, title, lead }: { eyebrow?: string; title: string; lead?: ReactNode }) {
  return (
    <header className="flex flex-col gap-2">
      {eyebrow ? (
        <p className="text-sm font-semibold tracking-wide text-russet-700 uppercase">{eyebrow}</p>
      ) : null}
      <h1 className="text-3xl font-semibold sm:text-4xl">{title}</h1>
      {lead ? <div className="max-w-prose text-lg text-loam-700">{lead}</div> : null}
    </header>
  );
}
