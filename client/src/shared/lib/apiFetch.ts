import { apiErrorSchema } from '../../../../shared/api/errors';

/**
 * A failed API call, carrying what the server said so forms can put each field's
 * message beside its field and pages can react to the status (401 → sign in again).
 */
export class ApiRequestError extends Error {
  readonly status: number;
  readonly code: string;
  readonly fields: Record<string, string>;
  /** Seconds from the Retry-After header of a 429, when the server sent one. */
  readonly retryAfterSeconds: number | undefined;

  constructor(init: {
    status: number;
    code: string;
    message: string;
    fields?: Record<string, string>;
    retryAfterSeconds?: number;
  }) {
    super(init.message);
    this.name = 'ApiRequestError';
    this.status = init.status;
    this.code = init.code;
    this.fields = init.fields ?? {};
    this.retryAfterSeconds = init.retryAfterSeconds;
  }
}

type ApiFetchOptions = {
  method?: 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';
  body?: unknown;
  signal?: AbortSignal;
};

/** Messages for failures that come without a readable error body (proxy down, HTML error page). */
function fallbackMessage(status: number): string {
  if (status === 0) return 'Seedwake could not reach its server. Check your connection and try again.';
  if (status === 413) return 'That is more data than the server accepts in one request.';
  if (status === 429) return 'Too many attempts. Wait a moment and try again.';
  if (status >= 500) return 'The server ran into a problem. Try again in a moment.';
  return `The request failed (HTTP ${status}).`;
}

function parseRetryAfter(header: string | null): number | undefined {
  if (header === null) return undefined;
  const seconds = Number(header);
  if (Number.isFinite(seconds) && seconds >= 0) return seconds;
  // Retry-After may also be an HTTP date (RFC 9110 §10.2.3).
  const at = Date.parse(header);
  return Number.isNaN(at) ? undefined : Math.max(0, Math.ceil((at - Date.now()) / 1000));
}

/**
 * JSON over same-origin fetch. The session cookie rides along (`same-origin`), and the
 * browser's Origin header is what the server checks on state-changing requests, so no
 * token is needed here. Resolves to the parsed body, or undefined for 204.
 */
export async function apiFetch<T>(path: string, options: ApiFetchOptions = {}): Promise<T> {
  const { method = 'GET', body, signal } = options;
  const headers: Record<string, string> = { Accept: 'application/json' };
  // A form (a file upload) carries its own multipart Content-Type with the boundary.
  const form = body instanceof FormData;
  if (body !== undefined && !form) headers['Content-Type'] = 'application/json';

  let response: Response;
  try {
    response = await fetch(path, {
      method,
      headers,
      body: body === undefined ? undefined : form ? body : JSON.stringify(body),
      credentials: 'same-origin',
      signal,
    });
  } catch (cause) {
    if (cause instanceof DOMException && cause.name === 'AbortError') throw cause;
    throw new ApiRequestError({ status: 0, code: 'network', message: fallbackMessage(0) });
  }

  if (response.status === 204) return undefined as T;

  const text = await response.text();
  let parsed: unknown;
  try {
    parsed = text === '' ? undefined : JSON.parse(text);
  } catch {
    parsed = undefined;
  }

  if (response.ok) return parsed as T;

  const errorBody = apiErrorSchema.safeParse(parsed);
  const retryAfterSeconds = parseRetryAfter(response.headers.get('Retry-After'));
  if (errorBody.success) {
    const { code, message, fields } = errorBody.data.error;
    throw new ApiRequestError({ status: response.status, code, message, fields, retryAfterSeconds });
  }
  throw new ApiRequestError({
    status: response.status,
    code: 'unknown',
    message: fallbackMessage(response.status),
    retryAfterSeconds,
  });
}
