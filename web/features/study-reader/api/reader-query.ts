import { queryOptions } from '@tanstack/react-query';
import { z } from 'zod';
import { studyDetailSchema } from '#shared/schemas/studies';
import { api } from '../../../lib/api-client';

const detailBody = z.object({ study: studyDetailSchema });

/**
 * The study as stored, for reading. Same key as the editor's study query (['studies', 'detail',
 * id]), so a save in the editor refreshes what the reader shows and a visit reuses the cache.
 */
export const readerStudyQuery = (id: number) =>
  queryOptions({
    queryKey: ['studies', 'detail', id] as const,
    queryFn: async ({ signal }) => (await api(`/api/studies/${id}`, { schema: detailBody, signal })).study,
  });
