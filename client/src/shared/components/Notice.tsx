import type { ReactNode } from 'react';
import { Button } from './Button';
import { Spinner } from './Spinner';

/** What a page shows while its data loads; polite so screen readers hear it without interruption. */
export function LoadingNotice({ children = 'Loading…' }: { children?: ReactNode }) {
  return (
    <p role="status" className="flex items-center gap-2 py-6 text-loam-700">
      <Spinner />
      <span>{children}</span>
    </p>
  );
}

/** A failed load, with the server's message and a way to try again. */
export function ErrorNotice({
  title,
  error,
  onRetry,
}: {
  title: string;
  error: unknown;
  onRetry?: () => void;
}) {
  const message = error instanceof Error ? error.message : 'Something went wrong.';
  return (
    <div
      role="alert"
      className="flex flex-col items-start gap-3 rounded-seed border border-danger-200 bg-danger-50 px-5 py-4"
    >
      <div>
        <p className="font-semibold text-danger-700">{title}</p>
        <p className="mt-1 text-sm text-humus-900">{message}</p>
      </div>
      {onRetry ? (
        <Button variant="secondary" size="sm" onClick={onRetry}>
          Try again
        </Button>
      ) : null}
    </div>
  );
}
