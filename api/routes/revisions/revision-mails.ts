import { createHash } from 'node:crypto';
import { and, eq, inArray } from 'drizzle-orm';
import type { Role } from '../../../shared/schemas/roles';
import type { AppContext } from '../../context';
import { memberships, users } from '../../db/schema/index';
import type { OutgoingMail } from '../../mail/mailer';
import type { RevisionContext } from './revision-access';

export type RevisionEvent = 'submitted' | 'changes-requested' | 'approved' | 'released';
export interface Person {
  id: number;
  email: string;
  name: string;
}

/** Active members of an engagement with one of the roles. */
export async function membersWithRoles(ctx: AppContext, engagementId: number, roles: Role[]): Promise<Person[]> {
  return ctx.db
    .select({ id: users.id, email: users.email, name: users.name })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(and(eq(memberships.engagementId, engagementId), inArray(users.role, roles), eq(users.status, 'active')));
}

/** The person who submitted, if still active. */
export async function submitterOf(ctx: AppContext, rc: RevisionContext): Promise<Person[]> {
  if (rc.revision.submittedBy === null) return [];
  return ctx.db.select({ id: users.id, email: users.email, name: users.name }).from(users).where(and(eq(users.id, rc.revision.submittedBy), eq(users.status, 'active')));
}

function body(event: RevisionEvent, rc: RevisionContext, to: Person, publicUrl: string, extra: { actorName: string; reason?: string }): OutgoingMail {
  const what = `revision ${rc.revision.number} of “${rc.study.title}” (${rc.engagement.name})`;
  const staffLink = `${publicUrl}/revisions/${rc.revision.id}`;
  const lines: Record<RevisionEvent, [string, string[]]> = {
    submitted: [`Review requested: ${rc.study.title}, revision ${rc.revision.number}`, [`${extra.actorName} submitted ${what} for review.`, 'Read it, comment, and approve or send it back here:', '', staffLink]],
    'changes-requested': [
      `Changes requested: ${rc.study.title}, revision ${rc.revision.number}`,
      [`${extra.actorName} asked for changes to ${what}:`, '', extra.reason ?? '', '', 'The study can be edited again; the comments are here:', '', staffLink],
    ],
    approved: [`Approved: ${rc.study.title}, revision ${rc.revision.number}`, [`${extra.actorName} approved ${what}. It is ready to be released.`, '', staffLink]],
    released: [
      `Released: ${rc.study.title}, revision ${rc.revision.number}`,
      [`${what} has been released as a signed PDF by ${extra.actorName}.`, 'Download it, or check a copy you hold, from your deliverables:', '', `${publicUrl}/deliverables`],
    ],
  };
  const [subject, text] = lines[event];
  return { to: to.email, subject, text: [`Hello ${to.name},`, '', ...text].join('\n') };
}

/**
 * Queues one e-mail per recipient in the persisted outbox. The dedupe key
 * `<event>:<revisionId>:<email>` makes a repeated or concurrent event add nothing. With a
 * transaction the rows commit with it and the caller kicks the outbox afterwards.
 */
export async function notifyRevision(
  ctx: AppContext,
  event: RevisionEvent,
  rc: RevisionContext,
  to: Person[],
  extra: { actorName: string; reason?: string },
  tx?: Parameters<AppContext['outbox']['enqueue']>[2],
): Promise<void> {
  const seen = new Set<string>();
  for (const p of to) {
    if (seen.has(p.email)) continue;
    seen.add(p.email);
    const key = `${event}:${rc.revision.id}:${p.email}`;
    // The outbox key column holds 200 characters; a very long address is keyed by its hash.
    const dedupe = key.length <= 200 ? key : `${event}:${rc.revision.id}:${createHash('sha256').update(p.email).digest('hex')}`;
    await ctx.outbox.enqueue(body(event, rc, p, ctx.config.publicUrl, extra), dedupe, tx);
  }
}
