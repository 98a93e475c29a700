import type { AuditAction } from '#shared/schemas/audit';

/** What the audit screen filters by, as kept in the address bar (dates as yyyy-mm-dd, local). */
export interface AuditFilters {
  action?: AuditAction;
  actorId?: number;
  engagementId?: number;
  from?: string;
  to?: string;
  q?: string;
}

/**
 * The API wants instants; a person picks days. "From" is the start of that local day,
 * "to" the end of it, so a single-day range shows the whole day.
 */
export function toAuditQuery(f: AuditFilters): Record<string, string | number | undefined> {
  return {
    action: f.action,
    actorId: f.actorId,
    engagementId: f.engagementId,
    from: f.from ? localDayBoundary(f.from, false) : undefined,
    to: f.to ? localDayBoundary(f.to, true) : undefined,
    q: f.q?.trim() || undefined,
  };
}

function localDayBoundary(day: string, end: boolean): string | undefined {
  const m = /^(\d{4})-(\d{2})-(\d{2})$/.exec(day);
  if (!m) return undefined;
  const d = end ? new Date(+m[1], +m[2] - 1, +m[3], 23, 59, 59, 999) : new Date(+m[1], +m[2] - 1, +m[3]);
  return d.toISOString();
}
