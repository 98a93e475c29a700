import { eq, sql } from 'drizzle-orm';
import type { SessionUser } from '../../../shared/schemas/auth';
import type { User } from '../../../shared/schemas/users';
import type { Db } from '../../db/client';
import { preparedPer } from '../../db/prepared';
import { users } from '../../db/schema/index';

export type UserRow = typeof users.$inferSelect;

export const toSessionUser = (u: Pick<UserRow, 'id' | 'email' | 'name' | 'role'>): SessionUser => ({ id: u.id, email: u.email, name: u.name, role: u.role });

export const toUser = (u: UserRow): User => ({
  id: u.id,
  email: u.email,
  name: u.name,
  role: u.role,
  status: u.status,
  createdAt: u.createdAt.toISOString(),
  lastSignInAt: u.lastSignInAt?.toISOString() ?? null,
});

export async function findUserByEmail(db: Db, email: string): Promise<UserRow | undefined> {
  const [row] = await db.select().from(users).where(eq(users.email, email.trim().toLowerCase()));
  return row;
}

/** Prepared once (db/prepared.ts): passport reads the user by id on signed-in requests. */
const userById = preparedPer((db: Db) => db.select().from(users).where(eq(users.id, sql.placeholder('id'))).prepare());

export async function findUserById(db: Db, id: number): Promise<UserRow | undefined> {
  const [row] = await userById(db).execute({ id });
  return row;
}
