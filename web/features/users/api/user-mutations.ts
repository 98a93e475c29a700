import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { userSchema, type InviteUser, type UpdateUser } from '#shared/schemas/users';
import { api } from '../../../lib/api-client';
import { engagementKeys } from '../../engagements/api/engagement-keys';
import { userKeys } from './user-keys';

const userBody = z.object({ user: userSchema });

/** Creates the account and e-mails the invitation. */
export function useInviteUser() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async (body: InviteUser) => (await api('/api/users', { method: 'POST', body, schema: userBody })).user,
    onSuccess: () => qc.invalidateQueries({ queryKey: userKeys.all }),
  });
}

export function useUpdateUser() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async ({ id, changes }: { id: number; changes: UpdateUser }) =>
      (await api(`/api/users/${id}`, { method: 'PATCH', body: changes, schema: userBody })).user,
    // Names and roles also appear in member lists.
    onSuccess: () => Promise.all([qc.invalidateQueries({ queryKey: userKeys.all }), qc.invalidateQueries({ queryKey: engagementKeys.all })]),
  });
}

/** Sends the invitation again; for someone already active it is a fresh link to set a password. */
export function useSendAccessEmail() {
  return useMutation({
    mutationFn: (id: number) => api(`/api/users/${id}/invitation`, { method: 'POST' }),
  });
}
