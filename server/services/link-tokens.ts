import { createHash, randomBytes } from 'node:crypto';

/** SHA-256 is enough for a secret of 256 random bits: there is nothing to guess from the hash. */
export const hashLinkToken = (token: string) => createHash('sha256').update(token).digest('hex');

/** The secret of an e-mailed link (shared/api/invitations.ts linkToken checks its shape). */
export function newLinkToken() {
  const token = randomBytes(32).toString('base64url');
  return { token, hash: hashLinkToken(token) };
}
