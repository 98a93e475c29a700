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

/**
 * Signs out. `leave` runs first on success (the caller moves to the sign-in page), and only then is
 * the session forgotten: forgetting it first makes RequireSession redirect as well, and that
 * second, late navigation could pull the person back from a page they had already moved on to.
 */
export function useSignOut(leave: () => void) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () => api('/api/auth/sign-out', { method: 'POST' }),
    onSuccess: leave,
    onSettled: () => {
      // Forget the person first so no screen refetches (and gets 401s), then drop their data.
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
