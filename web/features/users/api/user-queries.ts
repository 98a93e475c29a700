import { queryOptions } from '@tanstack/react-query';
import { z } from 'zod';
import { userSchema } from '#shared/schemas/users';
import { api } from '../../../lib/api-client';
import { userKeys } from './user-keys';

const listBody = z.object({ users: z.array(userSchema) });

/** Everyone with an account (administrators only). */
export const userListQuery = () =>
  queryOptions({
    queryKey: userKeys.list(),
    queryFn: async ({ signal }) => (await api('/api/users', { schema: listBody, signal })).users,
  });
