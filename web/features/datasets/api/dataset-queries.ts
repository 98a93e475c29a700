import { queryOptions } from '@tanstack/react-query';
import { z } from 'zod';
import { datasetSchema, datasetProblemSchema, DATASET_STATUSES, type DatasetFit } from '#shared/schemas/datasets';
import { studySummarySchema } from '#shared/schemas/studies';
import { api } from '../../../lib/api-client';
import { datasetKeys } from './dataset-keys';

const listBody = z.object({ datasets: z.array(datasetSchema) });
const detailBody = z.object({ dataset: datasetSchema });
// The fit's inner shape is the engine's own (typed in shared); only the envelope is checked here.
const fitBody = z.object({ status: z.enum(DATASET_STATUSES), progress: z.number(), rowsRead: z.number(), problem: datasetProblemSchema.nullable(), fit: z.record(z.string(), z.unknown()).nullable() });
const studiesBody = z.object({ studies: z.array(studySummarySchema) });

const busy = (status: string | undefined) => status === 'mapped' || status === 'fitting';

export const datasetsQuery = (engagementId: number) =>
  queryOptions({
    queryKey: datasetKeys.forEngagement(engagementId),
    queryFn: async ({ signal }) => (await api(`/api/engagements/${engagementId}/datasets`, { schema: listBody, signal })).datasets,
    // Keep the list's states moving while any fit runs.
    refetchInterval: (q) => (q.state.data?.some((d) => busy(d.status)) ? 1500 : false),
  });

/** One dataset; polled while its fit runs so the progress bar moves. */
export const datasetQuery = (id: number) =>
  queryOptions({
    queryKey: datasetKeys.detail(id),
    queryFn: async ({ signal }) => (await api(`/api/datasets/${id}`, { schema: detailBody, signal })).dataset,
    refetchInterval: (q) => (busy(q.state.data?.status) ? 700 : false),
  });

/** The stored fit; keyed by when it was made, so a refit is fetched afresh. */
export const datasetFitQuery = (id: number, fittedAt: string | null) =>
  queryOptions({
    queryKey: [...datasetKeys.fit(id), fittedAt] as const,
    enabled: fittedAt !== null,
    queryFn: async ({ signal }) => {
      const body = await api(`/api/datasets/${id}/fit`, { schema: fitBody, signal });
      return { ...body, fit: body.fit as unknown as DatasetFit | null };
    },
  });

/** Studies of the engagement, to choose where a staffing block goes. */
export const engagementStudiesQuery = (engagementId: number) =>
  queryOptions({
    queryKey: ['engagements', 'detail', engagementId, 'studies'] as const,
    queryFn: async ({ signal }) => (await api(`/api/engagements/${engagementId}/studies`, { schema: studiesBody, signal })).studies,
  });
