import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { assumptionSchema, movedNumberSchema, type CreateAssumption, type UpdateAssumption } from '#shared/schemas/assumptions';
import { api, ApiError } from '../../../lib/api-client';

const createdBody = z.object({ assumption: assumptionSchema });
const updatedBody = z.object({ assumption: assumptionSchema, moved: z.array(movedNumberSchema) });

// Usage counts and computed results live under the engagement (register, studies) and under
// the study details the editor caches; both families are refreshed after a change.
const engagementFamily = (engagementId: number) => ['engagements', 'detail', engagementId] as const;

export function useCreateAssumption(engagementId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async (body: CreateAssumption) =>
      (await api(`/api/engagements/${engagementId}/assumptions`, { method: 'POST', body, schema: createdBody })).assumption,
    onSuccess: () => qc.invalidateQueries({ queryKey: engagementFamily(engagementId) }),
  });
}

/** Sends only what changed plus the version edited; 409 when someone saved in between. */
export function useUpdateAssumption(engagementId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async ({ id, patch }: { id: number; patch: UpdateAssumption }) =>
      api(`/api/assumptions/${id}`, { method: 'PATCH', body: patch, schema: updatedBody }),
    onSuccess: async () => {
      // The editor keeps a study's results for as long as it is open and would show its cached
      // copy first on the next visit: drop the cached studies so they load with the new numbers.
      qc.removeQueries({ queryKey: ['studies'] });
      await qc.invalidateQueries({ queryKey: engagementFamily(engagementId) });
    },
    // Stale: fetch the version someone else saved so the form can offer it.
    onError: (err) => (err instanceof ApiError && err.status === 409 ? qc.invalidateQueries({ queryKey: engagementFamily(engagementId) }) : undefined),
  });
}

export function useDeleteAssumption(engagementId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api(`/api/assumptions/${id}`, { method: 'DELETE' }),
    onSuccess: () => qc.invalidateQueries({ queryKey: engagementFamily(engagementId) }),
  });
}
