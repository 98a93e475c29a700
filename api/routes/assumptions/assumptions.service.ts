import { and, eq, getTableColumns, sql } from 'drizzle-orm';
import type { Assumption, CreateAssumption, MovedNumber, UpdateAssumption } from '../../../shared/schemas/assumptions';
import type { SessionUser } from '../../../shared/schemas/auth';
import type { AppContext } from '../../context';
import type { Db } from '../../db/client';
import { preparedPer } from '../../db/prepared';
import { assumptions, engagements, memberships, users } from '../../db/schema/index';
import { HttpError, notFound } from '../../http-error';
import { recordAudit } from '../audit/audit.service';
import { seesEngagement, type EngagementRow } from '../engagements/engagement-access';
import { assertStudyRole } from '../studies/study-access';
import { blocksUsing, usageCount } from './assumption-usage';
import { propagateChange } from './propagate-change';

export type AssumptionRow = typeof assumptions.$inferSelect;

/** Names in the order of the column's case-insensitive collation, near enough for a list. */
const byName = new Intl.Collator('en', { sensitivity: 'base', numeric: true });

/** The register's columns; the cautions apart, as `a` is null where an engagement has none. */
const { cautions: _cautions, ...listed } = getTableColumns(assumptions);
const selected = { a: listed, cautions: assumptions.cautions, ownerName: users.name, usage: usageCount };

/** Assumptions with their owner's name and how many draft-study blocks link each. */
const query = (db: Db) => db.select(selected).from(assumptions).leftJoin(users, eq(users.id, assumptions.ownerId));

const toAssumption = ({ a, cautions, ownerName, usage }: { a: Omit<AssumptionRow, 'cautions'>; cautions: AssumptionRow['cautions']; ownerName: string | null; usage: number }): Assumption => ({
  id: a.id,
  engagementId: a.engagementId,
  name: a.name,
  value: a.value,
  unit: a.unit,
  sourceKind: a.sourceKind,
  sourceDetail: a.sourceDetail,
  ownerId: a.ownerId,
  ownerName,
  notes: a.notes,
  cautions: cautions ?? [],
  usageCount: usage,
  updatedAt: a.updatedAt.toISOString(),
  version: a.version,
});

/**
 * The register is read whenever a study opens in the editor: one query, built once (db/prepared.ts),
 * answers both whether the user may see the engagement (its membership joined in) and the register.
 * An engagement without assumptions still gives its one row, with `a` null.
 */
const registerWithAccess = preparedPer((db: Db) =>
  db
    .select({ memberId: memberships.userId, ...selected })
    .from(engagements)
    .leftJoin(memberships, and(eq(memberships.engagementId, engagements.id), eq(memberships.userId, sql.placeholder('userId'))))
    .leftJoin(assumptions, eq(assumptions.engagementId, engagements.id))
    .leftJoin(users, eq(users.id, assumptions.ownerId))
    .where(eq(engagements.id, sql.placeholder('engagementId')))
    .prepare(),
);

/** The register of an engagement the user may read (the same 404 as loadEngagementFor otherwise). */
export async function listAssumptionsFor(ctx: AppContext, user: SessionUser, engagementId: number): Promise<Assumption[]> {
  assertStudyRole(user, 'read');
  const rows = await registerWithAccess(ctx.db).execute({ userId: user.id, engagementId });
  if (!rows[0] || !seesEngagement(user, rows[0].memberId)) throw notFound('That engagement');
  // Sorted here, not by MariaDB: with the JSON column in the select, its sort goes through a
  // temporary table on disk, which tripled the database's time per register read under load.
  return rows.flatMap((r) => (r.a ? [toAssumption({ ...r, a: r.a })] : [])).sort((x, y) => byName.compare(x.name, y.name));
}

async function describe(ctx: AppContext, id: number): Promise<Assumption> {
  const [r] = await query(ctx.db).where(eq(assumptions.id, id));
  if (!r) throw notFound('That assumption');
  return toAssumption(r);
}

/** An owner must be a member of the engagement (the register names people the client knows). */
async function assertOwner(ctx: AppContext, engagementId: number, ownerId: number | null | undefined): Promise<void> {
  if (ownerId === null || ownerId === undefined) return;
  const [m] = await ctx.db.select().from(memberships).where(and(eq(memberships.engagementId, engagementId), eq(memberships.userId, ownerId)));
  if (!m) throw new HttpError(400, 'validation_failed', 'The owner must be a member of this engagement.', [{ path: 'ownerId', message: 'Not a member of this engagement' }]);
}

const duplicateName = (name: string): HttpError =>
  new HttpError(409, 'conflict', `This engagement already has an assumption named "${name}".`, [{ path: 'name', message: 'An assumption with this name exists' }]);
const isDuplicate = (err: unknown): boolean => (err as { cause?: { code?: string }; code?: string }).cause?.code === 'ER_DUP_ENTRY' || (err as { code?: string }).code === 'ER_DUP_ENTRY';

export async function createAssumption(ctx: AppContext, engagement: EngagementRow, input: CreateAssumption, by: SessionUser, ip?: string): Promise<Assumption> {
  await assertOwner(ctx, engagement.id, input.ownerId);
  const now = new Date();
  let id: number;
  try {
    [{ insertId: id }] = await ctx.db.insert(assumptions).values({ ...input, engagementId: engagement.id, createdAt: now, updatedAt: now });
  } catch (err) {
    if (isDuplicate(err)) throw duplicateName(input.name);
    throw err;
  }
  await recordAudit(ctx.db, { action: 'assumption_created', actor: by, engagementId: engagement.id, subject: input.name, detail: { assumptionId: id, value: input.value, unit: input.unit }, ip });
  return describe(ctx, id);
}

/**
 * Optimistic edit (409 with the current version when stale). A new value or unit recomputes every
 * block linking it in the engagement's draft studies, in the same transaction, and the answer
 * lists each number that moved.
 */
export async function updateAssumption(ctx: AppContext, row: AssumptionRow, patch: UpdateAssumption, by: SessionUser, ip?: string): Promise<{ assumption: Assumption; moved: MovedNumber[] }> {
  const { version, ...fields } = patch;
  await assertOwner(ctx, row.engagementId, fields.ownerId);
  let moved: MovedNumber[];
  try {
    // A fit's cautions describe the dataset: a value that stops naming the dataset as its source
    // loses them, and the blocks linking it are recomputed without them.
    const cautionsDropped = row.cautions !== null && fields.sourceKind !== undefined && fields.sourceKind !== 'dataset';
    moved = await ctx.db.transaction(async (tx) => {
      const [res] = await tx
        .update(assumptions)
        .set({ ...fields, ...(cautionsDropped ? { cautions: null } : {}), updatedAt: new Date(), version: sql`${assumptions.version} + 1` })
        .where(and(eq(assumptions.id, row.id), eq(assumptions.version, version)));
      if (res.affectedRows !== 1) {
        const [now] = await tx.select({ version: assumptions.version }).from(assumptions).where(eq(assumptions.id, row.id));
        throw new HttpError(409, 'conflict', 'Someone changed this assumption meanwhile. Reload to see their change.', [
          { path: 'version', message: `The assumption is now at version ${now?.version ?? version}` },
        ]);
      }
      const numbersChange = (fields.value !== undefined && fields.value !== row.value) || (fields.unit !== undefined && fields.unit !== row.unit);
      return numbersChange || cautionsDropped ? propagateChange(tx, row.engagementId, row.id) : [];
    });
  } catch (err) {
    if (isDuplicate(err)) throw duplicateName(fields.name ?? row.name);
    throw err;
  }
  const before = { value: row.value, unit: row.unit, name: row.name };
  await recordAudit(ctx.db, {
    action: 'assumption_updated',
    actor: by,
    engagementId: row.engagementId,
    subject: fields.name ?? row.name,
    detail: { assumptionId: row.id, before, changes: fields, movedNumbers: moved.length },
    ip,
  });
  return { assumption: await describe(ctx, row.id), moved };
}

/** Refused with 409 while any block links it; the issues name each block ("study — block"). */
export async function deleteAssumption(ctx: AppContext, row: AssumptionRow, by: SessionUser, ip?: string): Promise<void> {
  const uses = await blocksUsing(ctx.db, row.id);
  if (uses.length > 0) {
    const names = uses.map((u) => `${u.studyTitle} — ${u.blockTitle}`);
    throw new HttpError(409, 'conflict', `"${row.name}" is used by ${uses.length} model block${uses.length === 1 ? '' : 's'}: ${names.join('; ')}. Unlink it first.`, [
      ...uses.map((u, i) => ({ path: `usedBy.${i}`, message: names[i] })),
    ]);
  }
  try {
    await ctx.db.delete(assumptions).where(eq(assumptions.id, row.id));
  } catch (err) {
    // A save linked it between the check and the delete: the foreign key refuses.
    if ((err as { cause?: { code?: string } }).cause?.code === 'ER_ROW_IS_REFERENCED_2') throw new HttpError(409, 'conflict', `"${row.name}" has just been linked by a model block.`);
    throw err;
  }
  await recordAudit(ctx.db, { action: 'assumption_deleted', actor: by, engagementId: row.engagementId, subject: row.name, detail: { assumptionId: row.id, value: row.value, unit: row.unit }, ip });
}
