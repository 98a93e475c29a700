import { datetime, int, mysqlEnum, mysqlTable, uniqueIndex, varchar, index } from 'drizzle-orm/mysql-core';
import { ROLES } from '../../../shared/schemas/roles';

export const users = mysqlTable(
  'users',
  {
    id: int('id').autoincrement().primaryKey(),
    email: varchar('email', { length: 254 }).notNull(),
    name: varchar('name', { length: 120 }).notNull(),
    role: mysqlEnum('role', ROLES).notNull(),
    /** argon2id; null until an invitation is accepted. */
    passwordHash: varchar('password_hash', { length: 255 }),
    status: mysqlEnum('status', ['invited', 'active', 'deactivated']).notNull().default('invited'),
    createdAt: datetime('created_at', { mode: 'date', fsp: 3 }).notNull(),
    lastSignInAt: datetime('last_sign_in_at', { mode: 'date', fsp: 3 }),
    version: int('version').notNull().default(1),
  },
  (t) => [uniqueIndex('users_email_uq').on(t.email)],
);

/**
 * Single-use tokens sent by e-mail (invitations and password resets). Only a SHA-256 of the
 * token is stored, so a database leak does not hand out working links.
 */
export const accessTokens = mysqlTable(
  'access_tokens',
  {
    id: int('id').autoincrement().primaryKey(),
    userId: int('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    purpose: mysqlEnum('purpose', ['invitation', 'password_reset']).notNull(),
    tokenHash: varchar('token_hash', { length: 64 }).notNull(),
    expiresAt: datetime('expires_at', { mode: 'date', fsp: 3 }).notNull(),
    usedAt: datetime('used_at', { mode: 'date', fsp: 3 }),
    createdAt: datetime('created_at', { mode: 'date', fsp: 3 }).notNull(),
  },
  (t) => [uniqueIndex('access_tokens_hash_uq').on(t.tokenHash), index('access_tokens_user_idx').on(t.userId)],
);
