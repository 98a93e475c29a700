import { queryOptions } from '@tanstack/react-query';
import { z } from 'zod';
import { assumptionSchema } from '#shared/schemas/assumptions';
import { studyDetailSchema } from '#shared/schemas/studies';
import { api } from '../../../lib/api-client';
import { studyKeys } from './study-keys';

const detailBody = z.object({ study: studyDetailSchema });
const assumptionsBody = z.object({ assumptions: z.array(assumptionSchema) });

/** One study with its document, version and the server's results for every block. */
export const studyQuery = (id: number) =>
  queryOptions({
    queryKey: studyKeys.detail(id),
    queryFn: async ({ signal }) => (await api(`/api/studies/${id}`, { schema: detailBody, signal })).study,
    // The editor owns the text once it is open: a background refetch must not replace it.
    staleTime: Infinity,
  });

/** The engagement's assumption register, for linking inputs and previewing linked blocks. */
export const engagementAssumptionsQuery = (engagementId: number) =>
  queryOptions({
    queryKey: studyKeys.assumptions(engagementId),
    queryFn: async ({ signal }) => (await api(`/api/engagements/${engagementId}/assumptions`, { schema: assumptionsBody, signal })).assumptions,
  });
