import { DeleteObjectCommand } from '@aws-sdk/client-s3';
import { eq } from 'drizzle-orm';
import { Router, type Request } from 'express';
import { createDatasetAssumptionsSchema, datasetMappingSchema } from '../../../shared/schemas/datasets';
import type { AppContext } from '../../context';
import { datasets } from '../../db/schema/index';
import { notFound } from '../../http-error';
import { currentUser } from '../../middleware/auth';
import { idParam, parse } from '../../middleware/parse';
import { recordAudit } from '../audit/audit.service';
import { loadEngagementForStudies, type Access } from '../studies/study-access';
import { createDatasetAssumptions } from './dataset-assumptions';
import { loadDatasetFor } from './dataset-access';
import { describeDataset, listDatasets } from './datasets.service';
import { kickFit, needsKick } from './fit-job';
import { checkMapping } from './mapping-check';
import { readHead } from './read-head';
import { receiveUpload } from './receive-upload';
import { addStaffingBlock } from './staffing-block';

/**
 * Datasets of an engagement: upload (streamed to object storage), column mapping, the fit in the
 * background, and the ways from a fit into the study (assumptions, an interval-staffing block).
 * Same roles as studies: members who are partners or consultants write, admins read, clients never.
 */
export function datasetsRouter(ctx: AppContext): Router {
  const r = Router();
  const deps = { db: ctx.db, storage: ctx.storage };
  const dataset = (req: Request, access: Access) => loadDatasetFor(ctx.db, currentUser(req), idParam(req.params.id, 'That dataset'), access);
  const describe = async (id: number) => (await describeDataset(ctx, id)) ?? Promise.reject(notFound('That dataset'));

  r.post('/engagements/:id/datasets', async (req, res) => {
    const user = currentUser(req);
    const e = await loadEngagementForStudies(ctx.db, user, idParam(req.params.id, 'That engagement'), 'write');
    const id = await receiveUpload(ctx, e, req, res, user.id);
    const d = await describe(id);
    await recordAudit(ctx.db, { action: 'dataset_uploaded', actor: user, engagementId: e.id, subject: d.name, detail: { datasetId: id, bytes: d.byteSize, sha256: d.sha256 }, ip: req.ip });
    res.status(201).json({ dataset: d });
  });
  r.get('/engagements/:id/datasets', async (req, res) => {
    const e = await loadEngagementForStudies(ctx.db, currentUser(req), idParam(req.params.id, 'That engagement'), 'read');
    const list = await listDatasets(ctx, e.id);
    res.json({ datasets: list });
  });
  r.get('/datasets/:id', async (req, res) => {
    const { dataset: d } = await dataset(req, 'read');
    // A waiting fit (or one whose process died) is restarted by whoever looks at it.
    if (needsKick(d)) await kickFit(deps, d.id);
    res.json({ dataset: await describe(d.id) });
  });
  r.put('/datasets/:id/mapping', async (req, res) => {
    const { dataset: d } = await dataset(req, 'write');
    const mapping = parse(datasetMappingSchema, req.body);
    const head = mapping.delimiter !== d.detectedDelimiter ? await readHead(ctx.storage, d) : null;
    const { header, preview } = checkMapping(d, mapping, head);
    const now = new Date();
    // Clearing the token stops a fit still running on the old mapping (its writes check it).
    await ctx.db.update(datasets).set({ mapping, header, preview, status: 'mapped', jobToken: null, fit: null, problem: null, progress: 0, rowsRead: 0, fittedAt: null, updatedAt: now }).where(eq(datasets.id, d.id));
    await recordAudit(ctx.db, { action: 'dataset_mapped', actor: currentUser(req), engagementId: d.engagementId, subject: d.name, detail: { datasetId: d.id, mapping }, ip: req.ip });
    await kickFit(deps, d.id);
    res.json({ dataset: await describe(d.id) });
  });
  r.get('/datasets/:id/fit', async (req, res) => {
    const { dataset: d } = await dataset(req, 'read');
    if (needsKick(d)) await kickFit(deps, d.id);
    res.json({ status: d.status, progress: d.progress, rowsRead: d.rowsRead, problem: d.problem ?? null, fit: d.status === 'fitted' ? d.fit : null });
  });
  r.post('/datasets/:id/assumptions', async (req, res) => {
    const { dataset: d } = await dataset(req, 'write');
    const created = await createDatasetAssumptions(ctx, d, parse(createDatasetAssumptionsSchema, req.body), currentUser(req), req.ip);
    res.status(201).json({ assumptions: created });
  });
  r.post('/datasets/:id/staffing-block', async (req, res) => {
    const { dataset: d } = await dataset(req, 'write');
    res.status(201).json(await addStaffingBlock(ctx, d, req.body, currentUser(req)));
  });
  r.delete('/datasets/:id', async (req, res) => {
    const { dataset: d } = await dataset(req, 'write');
    await ctx.db.delete(datasets).where(eq(datasets.id, d.id));
    await ctx.storage.client.send(new DeleteObjectCommand({ Bucket: ctx.storage.bucket, Key: d.objectKey })).catch((err: Error) => console.error(`[datasets] could not remove ${d.objectKey}: ${err.message}`));
    await recordAudit(ctx.db, { action: 'dataset_deleted', actor: currentUser(req), engagementId: d.engagementId, subject: d.name, detail: { datasetId: d.id }, ip: req.ip });
    res.status(204).end();
  });
  return r;
}
