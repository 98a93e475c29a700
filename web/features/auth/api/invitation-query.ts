import { queryOptions } from '@tanstack/react-query';
import { z } from 'zod';
import { ROLES } from '#shared/schemas/roles';
import { api } from '../../../lib/api-client';
import { authKeys } from './auth-keys';

const invitationSchema = z.object({ email: z.string(), name: z.string(), role: z.enum(ROLES) });
export type Invitation = z.infer<typeof invitationSchema>;

export const invitationQueryOptions = (token: string) =>
  queryOptions({
    queryKey: authKeys.invitation(token),
    queryFn: ({ signal }) => api(`/api/invitations/${encodeURIComponent(token)}`, { schema: invitationSchema, signal }),
    staleTime: Infinity,
  });
