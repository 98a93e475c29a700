import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { studySummarySchema, type CreateStudy } from '#shared/schemas/studies';
import { api } from '../../../lib/api-client';

// The answer carries the whole study; the summary fields are all this screen needs (zod strips the rest).
const createdBody = z.object({ study: studySummarySchema });

/**
 * Creates a study, blank or from a template. A template also adds its assumptions to the
 * register, so the whole engagement family (studies and assumptions) is refreshed.
 */
export function useCreateStudy(engagementId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async (body: CreateStudy) =>
      (await api(`/api/engagements/${engagementId}/studies`, { method: 'POST', body, schema: createdBody })).study,
    onSuccess: () => qc.invalidateQueries({ queryKey: ['engagements', 'detail', engagementId] }),
  });
}
