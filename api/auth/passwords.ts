import argon2 from 'argon2';

/** argon2id with the library's defaults (64 MiB, t=3, p=4). */
export const hashPassword = (password: string): Promise<string> => argon2.hash(password, { type: argon2.argon2id });

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
