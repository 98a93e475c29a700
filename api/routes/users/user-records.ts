import { eq } from 'drizzle-orm';
import type { SessionUser } from '../../../shared/schemas/auth';
import type { User } from '../../../shared/schemas/users';
import type { Db } from '../../db/client';
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

export async function findUserById(db: Db, id: number): Promise<UserRow | undefined> {
  const [row] = await db.select().from(users).where(eq(users.id, id));
  return row;
}
