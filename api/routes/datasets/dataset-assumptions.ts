import { and, eq, inArray } from 'drizzle-orm';
import type { Assumption } from '../../../shared/schemas/assumptions';
import type { SessionUser } from '../../../shared/schemas/auth';
import type { CreateDatasetAssumptions } from '../../../shared/schemas/datasets';
import type { AppContext } from '../../context';
import { assumptions } from '../../db/schema/index';
import { HttpError } from '../../http-error';
import { listAssumptionsFor } from '../assumptions/assumptions.service';
import { recordAudit } from '../audit/audit.service';
import type { DatasetRow } from './dataset-access';
import { suggestionCautions } from './suggestion-cautions';

const isDuplicate = (err: unknown): boolean => {
  const e = err as { cause?: { code?: string }; code?: string };
  return e.cause?.code === 'ER_DUP_ENTRY' || e.code === 'ER_DUP_ENTRY';
};

/**
 * Adds the chosen fitted values to the register in one transaction (all or none), each with the
 * dataset as its source. A name already in the register is a 409 naming that row of the form.
 */
export async function createDatasetAssumptions(ctx: AppContext, dataset: DatasetRow, input: CreateDatasetAssumptions, by: SessionUser, ip?: string): Promise<Assumption[]> {
  const fit = dataset.fit;
  if (dataset.status !== 'fitted' || !fit) throw new HttpError(409, 'conflict', 'This dataset has no fit yet; wait for the fit to finish.');
  const seen = new Map<string, number>();
  input.assumptions.forEach((a, i) => {
    const key = a.name.toLowerCase();
    if (seen.has(key)) throw new HttpError(400, 'validation_failed', `Two rows are named "${a.name}".`, [{ path: `assumptions.${i}.name`, message: 'Same name as another row' }]);
    seen.set(key, i);
  });
  const existing = await ctx.db.select({ name: assumptions.name }).from(assumptions).where(and(eq(assumptions.engagementId, dataset.engagementId), inArray(assumptions.name, input.assumptions.map((a) => a.name))));
  const taken = existing.filter((e) => seen.has(e.name.toLowerCase()));
  const now = new Date();
  const sourceDetail = `Dataset "${dataset.name}" (#${dataset.id}), fitted ${dataset.fittedAt?.toISOString().slice(0, 10) ?? ''}`.slice(0, 500);
  const ids: number[] = [];
  try {
    await ctx.db.transaction(async (tx) => {
      for (const a of input.assumptions) {
        const { key, ...value } = a;
        const cautions = suggestionCautions(fit, key);
        const [res] = await tx
          .insert(assumptions)
          .values({ ...value, cautions: cautions.length > 0 ? cautions : null, engagementId: dataset.engagementId, sourceKind: 'dataset', sourceDetail, ownerId: by.id, createdAt: now, updatedAt: now });
        ids.push(res.insertId);
      }
    });
  } catch (err) {
    if (!isDuplicate(err)) throw err;
    const issues = input.assumptions.map((a, i) => ({ a, i })).filter(({ a }) => taken.some((t) => t.name.toLowerCase() === a.name.toLowerCase()) || taken.length === 0);
    throw new HttpError(409, 'conflict', 'The register already has an assumption with one of these names; rename it and try again.', issues.map(({ a, i }) => ({ path: `assumptions.${i}.name`, message: `"${a.name}" exists` })));
  }
  for (const [i, a] of input.assumptions.entries()) {
    await recordAudit(ctx.db, { action: 'assumption_created', actor: by, engagementId: dataset.engagementId, subject: a.name, detail: { assumptionId: ids[i], value: a.value, unit: a.unit, datasetId: dataset.id }, ip });
  }
  const all = await listAssumptionsFor(ctx, by, dataset.engagementId);
  return all.filter((a) => ids.includes(a.id));
}
