/*
 * Where to go after signing in. Only paths inside Seedwake are honoured: a `next` of
 * "//evil.example" or "https://…" would turn the sign-in page into an open redirect.
 */
export function safeReturnPath(next: string | null): string {
  if (next === null || !next.startsWith('/') || next.startsWith('//') || next.startsWith('/\\')) return '/';
  return next;
}

export function signInPathFor(location: { pathname: string; search: string }): string {
  const here = `${location.pathname}${location.search}`;
  return here === '/' ? '/sign-in' : `/sign-in?next=${encodeURIComponent(here)}`;
}
