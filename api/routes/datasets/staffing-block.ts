import { randomBytes } from 'node:crypto';
import type { SessionUser } from '../../../shared/schemas/auth';
import type { DatasetFit } from '../../../shared/schemas/datasets';
import { staffingBlockRequestSchema } from '../../../shared/schemas/datasets';
import type { AppContext } from '../../context';
import { HttpError, notFound } from '../../http-error';
import { saveStudyDocument } from '../studies/save-document';
import { loadStudyFor } from '../studies/study-access';
import type { DatasetRow } from './dataset-access';

const WEEKDAYS = ['Sunday', 'Monday', 'Tuesday', 'Wednesday', 'Thursday', 'Friday', 'Saturday'];
const hh = (h: number): string => `${String(h).padStart(2, '0')}:00`;

/**
 * Hourly arrival rates of the profile (the average week or one weekday), from the first to the
 * last hour with arrivals: the opening hours, so the block does not staff empty nights.
 */
export function hourlyRates(fit: DatasetFit, weekday: number | null): { first: number; rates: number[] } {
  const cells = weekday === null ? fit.demand.profile.byHour : fit.demand.profile.byWeekdayHour.filter((c) => c.weekday === weekday);
  const busy = cells.filter((c) => c.arrivals > 0).map((c) => c.hour);
  if (busy.length === 0) throw new HttpError(400, 'validation_failed', 'No arrivals were observed on that day.', [{ path: 'weekday', message: 'No arrivals on that day' }]);
  const first = Math.min(...busy);
  const last = Math.max(...busy);
  return { first, rates: cells.slice(first, last + 1).map((c) => Number(c.ratePerHour.toPrecision(4))) };
}

/**
 * Appends an interval-staffing model block built from the dataset's demand profile to a draft
 * study of the same engagement, through the studies service (sanitised, computed, versioned like
 * any save), with a sentence saying where the rates come from. Users then tune it in the editor.
 */
export async function addStaffingBlock(ctx: AppContext, dataset: DatasetRow, body: unknown, by: SessionUser): Promise<{ studyId: number; blockId: string; version: number }> {
  const input = staffingBlockRequestSchema.parse(body ?? {});
  if (dataset.status !== 'fitted' || !dataset.fit) throw new HttpError(409, 'conflict', 'This dataset has no fit yet; wait for the fit to finish.');
  const { study, engagement } = await loadStudyFor(ctx.db, by, input.studyId, 'write');
  if (study.engagementId !== dataset.engagementId) throw notFound('That study');
  const { first, rates } = hourlyRates(dataset.fit, input.weekday);
  const day = input.weekday === null ? 'an average day' : `${WEEKDAYS[input.weekday]}s`;
  const blockId = randomBytes(9).toString('base64url');
  const spec: Record<string, unknown> = {
    model: 'interval-staffing',
    arrivalRates: rates,
    intervalLength: 1,
    serviceRate: input.serviceRate,
    criterion: input.criterion,
    target: input.target,
    ...(input.criterion === 'serviceLevel' ? { t: input.t ?? 0.25 } : input.t ? { t: input.t } : {}),
  };
  const sentence = `Hourly arrival rates from ${hh(first)} to ${hh(first + rates.length)} on ${day}, fitted from the dataset "${dataset.name}" (${dataset.fit.rows.toLocaleString('en')} rows, ${dataset.fit.demand.timeZone}).`;
  const doc = study.document as { type: 'doc'; content?: unknown[] };
  const document = {
    ...doc,
    content: [
      ...(doc.content ?? []),
      { type: 'paragraph', content: [{ type: 'text', text: sentence }] },
      { type: 'modelBlock', attrs: { blockId, config: { title: `Staffing per hour, ${day}`, timeUnit: 'hour', spec, scenarios: [], chart: null } } },
    ],
  };
  const saved = await saveStudyDocument(ctx, study, engagement, { document, baseVersion: study.version }, by);
  return { studyId: saved.id, blockId, version: saved.version };
}
