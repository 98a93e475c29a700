import argon2 from 'argon2';

/**
 * argon2id at the OWASP password-storage minimum (19 MiB, 2 passes, 1 lane; common practice).
 * The library default (64 MiB, t=3, p=4) took ~850 ms a sign-in on a 2-core machine, which
 * made sign-in itself a denial-of-service lever.
 */
export const ARGON2_OPTIONS = { type: argon2.argon2id, memoryCost: 19_456, timeCost: 2, parallelism: 1 } as const;

export const hashPassword = (password: string): Promise<string> => argon2.hash(password, ARGON2_OPTIONS);

let dummy: Promise<string> | null = null;

/**
 * Verifies a password; with no stored hash it still spends the same effort on a dummy hash so
 * response times do not reveal which e-mail addresses have accounts.
 */
export async function verifyPassword(hash: string | null, password: string): Promise<boolean> {
  if (!hash) {
    dummy ??= hashPassword('not-a-real-password-for-timing');
    await argon2.verify(await dummy, password).catch(() => false);
    return false;
  }
  return argon2.verify(hash, password).catch(() => false);
}
