import { desc, eq, getTableColumns } from 'drizzle-orm';
import type { Dataset } from '../../../shared/schemas/datasets';
import type { AppContext } from '../../context';
import { datasets, users } from '../../db/schema/index';
import type { DatasetRow } from './dataset-access';

/** The public shape of a dataset row (never the object key, the job token or the fit itself). */
export function toDataset(d: DatasetRow, uploadedByName: string | null): Dataset {
  return {
    id: d.id,
    engagementId: d.engagementId,
    name: d.name,
    byteSize: d.byteSize,
    sha256: d.sha256,
    status: d.status,
    progress: d.progress,
    rowsRead: d.rowsRead,
    header: d.header,
    preview: d.preview,
    detectedDelimiter: d.detectedDelimiter,
    mapping: d.mapping as Record<string, unknown> | null,
    problem: d.problem ?? null,
    uploadedByName,
    createdAt: d.createdAt.toISOString(),
    fittedAt: d.fittedAt?.toISOString() ?? null,
  };
}

// Every column but the (possibly large) fit.
const { fit: _fit, ...listColumns } = getTableColumns(datasets);

export async function listDatasets(ctx: AppContext, engagementId: number): Promise<Dataset[]> {
  const rows = await ctx.db
    .select({ d: listColumns, by: users.name })
    .from(datasets)
    .leftJoin(users, eq(users.id, datasets.uploadedBy))
    .where(eq(datasets.engagementId, engagementId))
    .orderBy(desc(datasets.createdAt));
  return rows.map((r) => toDataset({ ...r.d, fit: null } as DatasetRow, r.by));
}

export async function describeDataset(ctx: AppContext, id: number): Promise<Dataset | null> {
  const [r] = await ctx.db.select({ d: datasets, by: users.name }).from(datasets).leftJoin(users, eq(users.id, datasets.uploadedBy)).where(eq(datasets.id, id));
  return r ? toDataset(r.d, r.by) : null;
}
