import { eq, sql } from 'drizzle-orm';
import type { FitWarning } from '../../../shared/queue/fit/index';
import type { Db } from '../../db/client';
import { assumptions } from '../../db/schema/index';
import type { Tx } from './block-rows';
import type { Register, RegisterEntry } from './resolve-spec';

/** A dataset's cautions hold while the value still names the dataset as its source. */
const cautions = sql<FitWarning[] | null>`case when ${assumptions.sourceKind} = 'dataset' then ${assumptions.cautions} end`;
const columns = { id: assumptions.id, name: assumptions.name, value: assumptions.value, unit: assumptions.unit, version: assumptions.version, cautions };

/** mysql2 decodes a JSON column by itself, but not the same text coming out of an expression. */
const entry = (r: Omit<RegisterEntry, 'cautions'> & { cautions: unknown }): RegisterEntry => ({
  ...r,
  value: Number(r.value),
  cautions: typeof r.cautions === 'string' ? (JSON.parse(r.cautions) as FitWarning[]) : ((r.cautions as FitWarning[] | null) ?? []),
});

/** The engagement's assumption register as the recompute needs it. */
export async function loadRegister(db: Db | Tx, engagementId: number): Promise<Map<number, RegisterEntry>> {
  const rows = await db.select(columns).from(assumptions).where(eq(assumptions.engagementId, engagementId));
  return new Map(rows.map((r) => [r.id, entry(r)]));
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
    sql`select id, name, value, unit, version, ${cautions} as cautions from ${assumptions} where engagement_id = ${engagementId} and id in (${sql.join(ids.map((id) => sql`${id}`), sql`, `)}) lock in share mode`,
  )) as unknown as [(Omit<RegisterEntry, 'cautions'> & { cautions: unknown })[]];
  return new Map(rows.map((r) => [r.id, entry(r)]));
}
