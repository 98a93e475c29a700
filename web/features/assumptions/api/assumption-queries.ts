import { queryOptions } from '@tanstack/react-query';
import { z } from 'zod';
import { assumptionSchema } from '#shared/schemas/assumptions';
import { studyDetailSchema } from '#shared/schemas/studies';
import { api } from '../../../lib/api-client';
import { blockTimeUnits } from '../lib/block-time-units';
import { assumptionKeys } from './assumption-keys';

const listBody = z.object({ assumptions: z.array(assumptionSchema) });
const studyBody = z.object({ study: studyDetailSchema });

/** The engagement's assumption register, in name order. */
export const assumptionsQuery = (engagementId: number) =>
  queryOptions({
    queryKey: assumptionKeys.forEngagement(engagementId),
    queryFn: async ({ signal }) => (await api(`/api/engagements/${engagementId}/assumptions`, { schema: listBody, signal })).assumptions,
  });

/**
 * Which time unit each model block of a study computes in: the moved-numbers answer carries bare
 * numbers, and a wait of 0.5 means nothing until we know it is in hours.
 */
export const blockUnitsQuery = (studyId: number) =>
  queryOptions({
    queryKey: assumptionKeys.blockUnits(studyId),
    queryFn: async ({ signal }) => blockTimeUnits((await api(`/api/studies/${studyId}`, { schema: studyBody, signal })).study.document),
    staleTime: 60_000,
  });
