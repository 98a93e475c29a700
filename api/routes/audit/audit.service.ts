import { and, desc, eq, gte, like, lt, lte, or, type SQL } from 'drizzle-orm';
import type { AuditAction, AuditEntry, AuditQuery } from '../../../shared/schemas/audit';
import type { Db } from '../../db/client';
import { auditEntries, engagements } from '../../db/schema/index';

export interface AuditEvent {
  action: AuditAction;
  actor?: { id: number; email: string } | null;
  /** E-mail typed at a failed sign-in, when there is no actor. */
  actorEmail?: string;
  engagementId?: number | null;
  subject?: string | null;
  detail?: Record<string, unknown> | null;
  ip?: string | null;
}

/** Appends one entry (inside the caller's transaction when given one); callers await it so a failed write fails the request instead of vanishing. */
export async function recordAudit(db: Pick<Db, 'insert'>, e: AuditEvent): Promise<void> {
  await db.insert(auditEntries).values({
    at: new Date(),
    action: e.action,
    actorId: e.actor?.id ?? null,
    actorEmail: e.actor?.email ?? e.actorEmail ?? null,
    engagementId: e.engagementId ?? null,
    subject: e.subject?.slice(0, 300) ?? null,
    detail: e.detail ?? null,
    ip: e.ip ?? null,
  });
}

export async function listAudit(db: Db, q: AuditQuery): Promise<{ entries: AuditEntry[]; nextBeforeId: number | null }> {
  const where: SQL[] = [];
  if (q.action) where.push(eq(auditEntries.action, q.action));
  if (q.actorId) where.push(eq(auditEntries.actorId, q.actorId));
  if (q.engagementId) where.push(eq(auditEntries.engagementId, q.engagementId));
  if (q.from) where.push(gte(auditEntries.at, new Date(q.from)));
  if (q.to) where.push(lte(auditEntries.at, new Date(q.to)));
  if (q.beforeId) where.push(lt(auditEntries.id, q.beforeId));
  if (q.q) {
    const pattern = `%${q.q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
    where.push(or(like(auditEntries.actorEmail, pattern), like(auditEntries.subject, pattern)) as SQL);
  }
  const rows = await db
    .select({ entry: auditEntries, engagementName: engagements.name })
    .from(auditEntries)
    .leftJoin(engagements, eq(engagements.id, auditEntries.engagementId))
    .where(where.length ? and(...where) : undefined)
    .orderBy(desc(auditEntries.id))
    .limit(q.limit + 1);
  const page = rows.slice(0, q.limit);
  return {
    entries: page.map(({ entry, engagementName }) => ({
      id: entry.id,
      at: entry.at.toISOString(),
      action: entry.action,
      actorId: entry.actorId,
      actorEmail: entry.actorEmail,
      engagementId: entry.engagementId,
      engagementName: engagementName ?? null,
      subject: entry.subject,
      detail: entry.detail ?? null,
      ip: entry.ip,
    })),
    nextBeforeId: rows.length > q.limit ? (page[page.length - 1]?.entry.id ?? null) : null,
  };
}
