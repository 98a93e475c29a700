import { queryOptions } from '@tanstack/react-query';
import { z } from 'zod';
import { sessionUserSchema, type SessionUser } from '#shared/schemas/auth';
import { api } from '../../../lib/api-client';
import { isApiError } from '../../../lib/api-error';
import { authKeys } from './auth-keys';

const meSchema = z.object({ user: sessionUserSchema });

/** Who is signed in; `null` when nobody is (a 401 here is an answer, not a failure). */
export const sessionQueryOptions = () =>
  queryOptions({
    queryKey: authKeys.session(),
    queryFn: async ({ signal }): Promise<SessionUser | null> => {
      try {
        return (await api('/api/auth/me', { schema: meSchema, signal })).user;
      } catch (err) {
        if (isApiError(err) && err.status === 401) return null;
        throw err;
      }
    },
    staleTime: 5 * 60_000,
  });
