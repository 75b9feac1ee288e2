import { ApiRequestError } from '../lib/apiFetch';

function waitPhrase(seconds: number): string {
  if (seconds < 60) return `${seconds} second${seconds === 1 ? '' : 's'}`;
  const minutes = Math.ceil(seconds / 60);
  return `${minutes} minute${minutes === 1 ? '' : 's'}`;
}

/**
 * The general message of a failed submit, announced when it appears. Field messages are
 * shown beside their fields; this says what went wrong overall (or that fields need a look).
 */
export function FormAlert({ error }: { error: unknown }) {
  if (error === null || error === undefined) return null;
  const message = error instanceof Error ? error.message : 'Something went wrong. Try again.';
  const retry =
    error instanceof ApiRequestError && error.status === 429 && error.retryAfterSeconds !== undefined
      ? ` You can try again in ${waitPhrase(error.retryAfterSeconds)}.`
      : '';
  return (
    <div
      role="alert"
      className="rounded-seed border-l-4 border-danger-700 bg-danger-50 px-4 py-3 text-sm text-danger-700"
    >
      <p className="font-medium">
        {message}
        {retry}
      </p>
    </div>
  );
}
