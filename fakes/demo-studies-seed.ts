/**
 * Two draft studies for the demo, so a first look at Sojourn finds a report to open: each made
 * from a template through the same path as "New study" (its assumptions join the register, every
 * block computed by the server). Invented scenarios, like the rest of the demo.
 */
import { eq } from 'drizzle-orm';
import type { Db } from '../api/db/client';
import { engagements, users } from '../api/db/schema/index';
import { createStudy } from '../api/routes/studies/create-study';

const DEMO_STUDIES = [
  { engagement: 'Permit counter wait times', title: 'Counter desks on weekday mornings', templateKey: 'service-desk-staffing', author: 'consultant@sojourn.test' },
  { engagement: 'Donor intake desk capacity', title: 'Intake and screening at the mobile sessions', templateKey: 'clinic-intake-capacity', author: 'consultant@sojourn.test' },
] as const;

export async function seedDemoStudies(db: Db): Promise<void> {
  for (const s of DEMO_STUDIES) {
    const [engagement] = await db.select().from(engagements).where(eq(engagements.name, s.engagement));
    const [author] = await db.select({ id: users.id, email: users.email, name: users.name, role: users.role }).from(users).where(eq(users.email, s.author));
    if (!engagement || !author) throw new Error(`The demo study "${s.title}" needs its engagement and author seeded first.`);
    await createStudy({ db }, engagement, { title: s.title, templateKey: s.templateKey }, author);
  }
}
