import { ApiRequestError } from '../lib/apiFetch';
import { NotFoundNotice } from './NotFoundNotice';
import { ErrorNotice } from './Notice';

/**
 * Why a detail page has nothing to show: a 404 reads as "no such …" (the same whether the
 * thing is gone or never shared), anything else as a failure that can be retried.
 */
export function LoadFailure({ error, what, onRetry }: { error: Error; what: string; onRetry: () => void }) {
  if (error instanceof ApiRequestError && error.status === 404) return <NotFoundNotice what={what} />;
  return <ErrorNotice title={`Seedwake could not load this ${what}`} error={error} onRetry={onRetry} />;
}
