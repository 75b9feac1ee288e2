import argon2 from 'argon2';

/**
 * argon2id with the OWASP Password Storage Cheat Sheet's first recommended setting:
 * m = 19 MiB, t = 2, p = 1.
 */
const OPTIONS = { type: argon2.argon2id, memoryCost: 19_456, timeCost: 2, parallelism: 1 } as const;

export const hashPassword = (password: string) => argon2.hash(password, OPTIONS);

export async function verifyPassword(hash: string, password: string) {
  try {
    return await argon2.verify(hash, password);
  } catch {
    return false;
  }
}

/** Verified against when the account does not exist, so both cases take the same time. */
let dummyHash: Promise<string> | undefined;
export const timingDummyHash = () => (dummyHash ??= hashPassword('seedwake-no-such-account-placeholder'));
