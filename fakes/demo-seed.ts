/**
 * Demo data: an invented consultancy, three invented client engagements and two draft studies.
 * Runs once (it checks for the demo admin first), so a second start keeps what people changed.
 */
import { eq } from 'drizzle-orm';
import type { Role } from '../shared/schemas/roles';
import { hashPassword } from '../api/auth/passwords';
import type { Db } from '../api/db/client';
import { engagements, memberships, users } from '../api/db/schema/index';
import { seedDemoStudies } from './demo-studies-seed';

export const DEMO_USERS: { email: string; name: string; role: Role }[] = [
  { email: 'admin@sojourn.test', name: 'Ines Calloway', role: 'admin' },
  { email: 'partner@sojourn.test', name: 'Rafael Okonjo', role: 'partner' },
  { email: 'consultant@sojourn.test', name: 'Mira Lindqvist', role: 'consultant' },
  { email: 'consultant2@sojourn.test', name: 'Owen Thackeray', role: 'consultant' },
  { email: 'client@sojourn.test', name: 'Dana Whitcombe', role: 'client' },
  { email: 'client2@sojourn.test', name: 'Sol Abernethy', role: 'client' },
];

export const DEMO_ENGAGEMENTS = [
  {
    key: 'permits',
    name: 'Permit counter wait times',
    clientName: 'Town of Eastmere Permits Office',
    description:
      'How many counter desks the permits office needs on weekday mornings so that nine in ten visitors are seen within fifteen minutes, now and after the spring rule change.',
    safetyCritical: false,
    members: ['partner@sojourn.test', 'consultant@sojourn.test', 'client@sojourn.test'],
  },
  {
    key: 'donor',
    name: 'Donor intake desk capacity',
    clientName: 'Fenwold Community Blood Service',
    description:
      'Intake desks and screening nurses for the mobile donation sessions: waiting before screening, walk-aways at peak, and the effect of booking slots.',
    safetyCritical: true,
    members: ['partner@sojourn.test', 'consultant@sojourn.test', 'consultant2@sojourn.test'],
  },
  {
    key: 'support',
    name: 'Support line staffing plan',
    clientName: 'Quillmoor Software',
    description:
      'Agents per half hour for the customer support line through the product launch, with callers who hang up while waiting, and the cost of each service level.',
    safetyCritical: false,
    members: ['partner@sojourn.test', 'consultant2@sojourn.test', 'client2@sojourn.test'],
  },
] as const;

export async function seedDemo(db: Db, password: string): Promise<boolean> {
  const [existing] = await db.select({ id: users.id }).from(users).where(eq(users.email, 'admin@sojourn.test'));
  if (existing) return false;
  const passwordHash = await hashPassword(password);
  const now = new Date();
  const ids = new Map<string, number>();
  for (const u of DEMO_USERS) {
    const [res] = await db.insert(users).values({ ...u, passwordHash, status: 'active', createdAt: now });
    ids.set(u.email, res.insertId);
  }
  for (const e of DEMO_ENGAGEMENTS) {
    const [res] = await db.insert(engagements).values({
      name: e.name,
      clientName: e.clientName,
      description: e.description,
      safetyCritical: e.safetyCritical,
      createdAt: now,
      updatedAt: now,
    });
    for (const email of e.members) {
      await db.insert(memberships).values({ engagementId: res.insertId, userId: ids.get(email)!, addedAt: now });
    }
  }
  await seedDemoStudies(db);
  return true;
}
