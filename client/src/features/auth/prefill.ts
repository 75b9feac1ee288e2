/*
 * An address handed from one page to the next (invitation → sign-up, sign-in → forgot
 * password, reset → sign-in) travels in the router's history state, not the URL, so it
 * is not written to server logs or left in shared links.
 */
export type EmailState = { email: string };

export function prefilledEmail(state: unknown): string {
  const email = (state as Partial<EmailState> | null)?.email;
  return typeof email === 'string' ? email : '';
}
