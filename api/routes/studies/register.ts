import { eq, sql } from 'drizzle-orm';
import type { Db } from '../../db/client';
import { assumptions } from '../../db/schema/index';
import type { Tx } from './block-rows';
import type { Register, RegisterEntry } from './resolve-spec';

const columns = { id: assumptions.id, name: assumptions.name, value: assumptions.value, unit: assumptions.unit, version: assumptions.version, cautions: assumptions.cautions };

/** The engagement's assumption register as the recompute needs it. */
export async function loadRegister(db: Db | Tx, engagementId: number): Promise<Map<number, RegisterEntry>> {
  const rows = await db.select(columns).from(assumptions).where(eq(assumptions.engagementId, engagementId));
  return new Map(rows.map((r) => [r.id, { ...r, cautions: r.cautions ?? [] }]));
}

/**
 * Re-reads the given assumptions with a shared lock inside a save's transaction. A concurrent
 * assumption edit either finished before (and is seen here) or waits until the save commits (and
 * then recomputes the saved blocks), so saved results never mix old and new values.
 */
export async function lockedEntries(tx: Tx, engagementId: number, ids: number[]): Promise<Register> {
  if (ids.length === 0) return new Map();
  // MariaDB has no FOR SHARE (drizzle's .for('share')): LOCK IN SHARE MODE is its spelling.
  const [rows] = (await tx.execute(
    sql`select id, name, value, unit, version from ${assumptions} where engagement_id = ${engagementId} and id in (${sql.join(ids.map((id) => sql`${id}`), sql`, `)}) lock in share mode`,
  )) as unknown as [RegisterEntry[]];
  return new Map(rows.map((r) => [r.id, { ...r, value: Number(r.value) }]));
}
