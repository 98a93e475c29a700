import { queryOptions } from '@tanstack/react-query';
import { z } from 'zod';
import { studySummarySchema, templateSummarySchema } from '#shared/schemas/studies';
import { api } from '../../../lib/api-client';
import { studyListKeys } from './study-list-keys';

const listBody = z.object({ studies: z.array(studySummarySchema) });
const templatesBody = z.object({ templates: z.array(templateSummarySchema) });

/** The studies of one engagement (members and administrators; never clients). */
export const engagementStudiesQuery = (engagementId: number) =>
  queryOptions({
    queryKey: studyListKeys.forEngagement(engagementId),
    queryFn: async ({ signal }) => (await api(`/api/engagements/${engagementId}/studies`, { schema: listBody, signal })).studies,
  });

/** The templates a study can start from; they change only with a release, so keep them a while. */
export const templatesQuery = () =>
  queryOptions({
    queryKey: studyListKeys.templates(),
    queryFn: async ({ signal }) => (await api('/api/templates', { schema: templatesBody, signal })).templates,
    staleTime: 10 * 60_000,
  });
