import { createHash, randomBytes } from 'node:crypto';
import { and, eq, gt, isNull } from 'drizzle-orm';
import type { Db } from '../../db/client';
import { accessTokens } from '../../db/schema/index';

export type TokenPurpose = 'invitation' | 'password_reset';

export const TOKEN_TTL_MS: Record<TokenPurpose, number> = {
  invitation: 7 * 24 * 3600_000,
  password_reset: 3600_000,
};

const hash = (raw: string): string => createHash('sha256').update(raw).digest('hex');

/** Issues a single-use token; only its SHA-256 is stored. Older unused tokens of the purpose die. */
export async function issueToken(db: Db, userId: number, purpose: TokenPurpose): Promise<string> {
  const raw = randomBytes(32).toString('base64url');
  const now = new Date();
  await db
    .update(accessTokens)
    .set({ usedAt: now })
    .where(and(eq(accessTokens.userId, userId), eq(accessTokens.purpose, purpose), isNull(accessTokens.usedAt)));
  await db.insert(accessTokens).values({
    userId,
    purpose,
    tokenHash: hash(raw),
    createdAt: now,
    expiresAt: new Date(now.getTime() + TOKEN_TTL_MS[purpose]),
  });
  return raw;
}

/** The user id of a live token, without using it up. */
export async function peekToken(db: Db, raw: string, purpose: TokenPurpose): Promise<number | null> {
  const [row] = await db
    .select({ userId: accessTokens.userId })
    .from(accessTokens)
    .where(
      and(eq(accessTokens.tokenHash, hash(raw)), eq(accessTokens.purpose, purpose), isNull(accessTokens.usedAt), gt(accessTokens.expiresAt, new Date())),
    );
  return row?.userId ?? null;
}

/**
 * Uses a token up atomically (the UPDATE only matches a live token), so two concurrent uses
 * cannot both succeed. Returns the user id, or null when expired, used or unknown.
 */
export async function consumeToken(db: Db, raw: string, purpose: TokenPurpose): Promise<number | null> {
  const userId = await peekToken(db, raw, purpose);
  if (userId === null) return null;
  const [result] = await db
    .update(accessTokens)
    .set({ usedAt: new Date() })
    .where(and(eq(accessTokens.tokenHash, hash(raw)), isNull(accessTokens.usedAt), gt(accessTokens.expiresAt, new Date())));
  return result.affectedRows === 1 ? userId : null;
}
