import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { engagementSchema, memberSchema, type CreateEngagement, type UpdateEngagement } from '#shared/schemas/engagements';
import { api } from '../../../lib/api-client';
import { engagementKeys } from './engagement-keys';

const engagementBody = z.object({ engagement: engagementSchema });
const memberBody = z.object({ member: memberSchema });

export function useCreateEngagement() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async (body: CreateEngagement) => (await api('/api/engagements', { method: 'POST', body, schema: engagementBody })).engagement,
    onSuccess: () => qc.invalidateQueries({ queryKey: engagementKeys.lists() }),
  });
}

/** Sends the version the person edited; the API answers 409 when someone saved in between. */
export function useUpdateEngagement(id: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async (body: UpdateEngagement) =>
      (await api(`/api/engagements/${id}`, { method: 'PATCH', body, schema: engagementBody })).engagement,
    onSuccess: (engagement) => {
      qc.setQueryData(engagementKeys.detail(id), engagement);
      return qc.invalidateQueries({ queryKey: engagementKeys.all });
    },
  });
}

export function useAddMember(engagementId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async (userId: number) =>
      (await api(`/api/engagements/${engagementId}/members`, { method: 'POST', body: { userId }, schema: memberBody })).member,
    // Member count shows in the detail and the lists, so refresh the whole family.
    onSuccess: () => qc.invalidateQueries({ queryKey: engagementKeys.all }),
  });
}

export function useRemoveMember(engagementId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (userId: number) => api(`/api/engagements/${engagementId}/members/${userId}`, { method: 'DELETE' }),
    onSuccess: () => qc.invalidateQueries({ queryKey: engagementKeys.all }),
  });
}
