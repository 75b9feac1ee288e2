import { afterEach, describe, expect, it, vi } from 'vitest';
import { ApiRequestError, apiFetch } from '../../../../client/src/shared/lib/apiFetch';

/*
 * apiFetch against the HTTP contract the API documents: JSON bodies, the error body
 * { error: { code, message, fields? } }, 204 No Content, and Retry-After as defined in
 * RFC 9110 §10.2.3 (either delay-seconds or an HTTP-date).
 */

type Call = { url: string; init: RequestInit };

function stubFetch(response: () => Response): Call[] {
  const calls: Call[] = [];
  vi.stubGlobal('fetch', async (url: string, init: RequestInit) => {
    calls.push({ url, init });
    return response();
  });
  return calls;
}

afterEach(() => {
  vi.unstubAllGlobals();
  vi.useRealTimers();
});

async function rejection(promise: Promise<unknown>): Promise<ApiRequestError> {
  try {
    await promise;
  } catch (error) {
    if (error instanceof ApiRequestError) return error;
    throw error;
  }
  throw new Error('expected the request to fail');
}

describe('apiFetch', () => {
  it('sends JSON with the same-origin cookie and parses the JSON answer', async () => {
    const calls = stubFetch(
      () =>
        new Response(JSON.stringify({ id: 'w1' }), {
          status: 201,
          headers: { 'Content-Type': 'application/json' },
        }),
    );
    const result = await apiFetch<{ id: string }>('/api/workspaces', {
      method: 'POST',
      body: { name: 'North block' },
    });
    expect(result).toEqual({ id: 'w1' });
    expect(calls[0].init.credentials).toBe('same-origin');
    expect(calls[0].init.method).toBe('POST');
    expect(new Headers(calls[0].init.headers).get('Content-Type')).toBe('application/json');
    expect(JSON.parse(String(calls[0].init.body))).toEqual({ name: 'North block' });
  });

  it('resolves 204 No Content to undefined (RFC 9110 §15.3.5: a 204 has no content)', async () => {
    stubFetch(() => new Response(null, { status: 204 }));
    await expect(apiFetch('/api/auth/sign-out', { method: 'POST' })).resolves.toBeUndefined();
  });

  it('turns the error body into status, code, message and per-field messages', async () => {
    const body = {
      error: {
        code: 'invalid',
        message: 'Check the marked fields',
        fields: { email: 'Enter a valid e-mail address' },
      },
    };
    stubFetch(
      () =>
        new Response(JSON.stringify(body), { status: 400, headers: { 'Content-Type': 'application/json' } }),
    );
    const error = await rejection(apiFetch('/api/auth/sign-up', { method: 'POST', body: {} }));
    expect(error.status).toBe(400);
    expect(error.code).toBe('invalid');
    expect(error.message).toBe('Check the marked fields');
    expect(error.fields).toEqual({ email: 'Enter a valid e-mail address' });
  });

  it('reads Retry-After given in seconds (RFC 9110 §10.2.3 delay-seconds)', async () => {
    const body = { error: { code: 'rate_limited', message: 'Too many attempts' } };
    stubFetch(() => new Response(JSON.stringify(body), { status: 429, headers: { 'Retry-After': '120' } }));
    const error = await rejection(apiFetch('/api/auth/sign-in', { method: 'POST', body: {} }));
    expect(error.status).toBe(429);
    expect(error.retryAfterSeconds).toBe(120);
  });

  it('reads Retry-After given as an HTTP-date (RFC 9110 §10.2.3, IMF-fixdate of §5.6.7)', async () => {
    vi.useFakeTimers();
    vi.setSystemTime(new Date('2025-06-01T12:00:00Z'));
    const body = { error: { code: 'rate_limited', message: 'Too many attempts' } };
    stubFetch(
      () =>
        new Response(JSON.stringify(body), {
          status: 429,
          headers: { 'Retry-After': 'Sun, 01 Jun 2025 12:05:00 GMT' },
        }),
    );
    const error = await rejection(apiFetch('/api/auth/sign-in', { method: 'POST', body: {} }));
    expect(error.retryAfterSeconds).toBe(300);
  });

  it('keeps the status of an answer without a readable error body, such as a proxy page', async () => {
    stubFetch(
      () =>
        new Response('<html>Bad Gateway</html>', { status: 502, headers: { 'Content-Type': 'text/html' } }),
    );
    const error = await rejection(apiFetch('/api/auth/me'));
    expect(error.status).toBe(502);
    expect(error.message).not.toContain('<html>');
  });

  it('reports a network failure as status 0 rather than an unhandled TypeError', async () => {
    vi.stubGlobal('fetch', async () => {
      throw new TypeError('fetch failed');
    });
    const error = await rejection(apiFetch('/api/auth/me'));
    expect(error.status).toBe(0);
  });
});
