import { queryOptions } from '@tanstack/react-query';
import { z } from 'zod';
import { deliverableSchema, pdfLinkSchema } from '#shared/schemas/revisions';
import { api } from '../../../lib/api-client';

const listBody = z.object({ deliverables: z.array(deliverableSchema) });

/**
 * Released revisions the signed-in person may download. Under ['revisions', …] so a release
 * elsewhere in the app refreshes this list by the same prefix.
 */
export const deliverablesQuery = () =>
  queryOptions({
    queryKey: ['revisions', 'deliverables'] as const,
    queryFn: async ({ signal }) => (await api('/api/deliverables', { schema: listBody, signal })).deliverables,
  });

/** A short-lived download link for one deliverable; asked for at the moment of download, never cached. */
export const fetchPdfLink = (revisionId: number) => api(`/api/revisions/${revisionId}/pdf`, { schema: pdfLinkSchema });
