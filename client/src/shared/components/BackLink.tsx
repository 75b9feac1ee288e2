import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';

/** The way back from a detail page to its list; not printed, since paper has no links. */
export function BackLink({ to, children }: { to: string; children: ReactNode }) {
  return (
    <Link
      to={to}
      className="self-start text-sm font-medium text-russet-700 underline underline-offset-4 hover:text-russet-800 print:hidden"
    >
      {children}
    </Link>
  );
}
