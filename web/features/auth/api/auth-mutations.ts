import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import {
  sessionUserSchema,
  type InvitationAccept,
  type PasswordResetConfirm,
  type PasswordResetRequest,
  type SignInBody,
} from '#shared/schemas/auth';
import { api } from '../../../lib/api-client';
import { authKeys } from './auth-keys';

const userBody = z.object({ user: sessionUserSchema });
const okBody = z.object({ ok: z.literal(true) });

export function useSignIn() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: SignInBody) => api('/api/auth/sign-in', { method: 'POST', body, schema: userBody }),
    onSuccess: ({ user }) => {
      // Whatever the previous person had cached must not leak into this session.
      qc.removeQueries({ predicate: (q) => q.queryKey[0] !== authKeys.all[0] });
      qc.setQueryData(authKeys.session(), user);
    },
  });
}

export function useSignOut() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () => api('/api/auth/sign-out', { method: 'POST' }),
    onSettled: () => {
      // Forget the person first so RequireSession unmounts the screens, then drop their data;
      // the other order lets still-mounted screens refetch (and get 401s) in between.
      qc.setQueryData(authKeys.session(), null);
      qc.removeQueries({ predicate: (q) => q.queryKey[0] !== authKeys.all[0] });
    },
  });
}

export function useRequestPasswordReset() {
  return useMutation({
    mutationFn: (body: PasswordResetRequest) => api('/api/auth/password-reset', { method: 'POST', body, schema: okBody }),
  });
}

export function useConfirmPasswordReset() {
  return useMutation({
    mutationFn: (body: PasswordResetConfirm) => api('/api/auth/password-reset/confirm', { method: 'POST', body, schema: okBody }),
  });
}

export function useAcceptInvitation(token: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: InvitationAccept) =>
      api(`/api/invitations/${encodeURIComponent(token)}/accept`, { method: 'POST', body, schema: userBody }),
    onSuccess: ({ user }) => {
      qc.removeQueries({ predicate: (q) => q.queryKey[0] !== authKeys.all[0] });
      qc.setQueryData(authKeys.session(), user);
    },
  });
}
