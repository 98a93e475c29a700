import { queryOptions } from '@tanstack/react-query';
import { z } from 'zod';
import { engagementSchema, memberSchema } from '#shared/schemas/engagements';
import { api } from '../../../lib/api-client';
import { engagementKeys } from './engagement-keys';

const listBody = z.object({ engagements: z.array(engagementSchema) });
const detailBody = z.object({ engagement: engagementSchema });
const membersBody = z.object({ members: z.array(memberSchema) });

/** Members see their engagements; administrators see all. */
export const engagementListQuery = () =>
  queryOptions({
    queryKey: engagementKeys.list(),
    queryFn: async ({ signal }) => (await api('/api/engagements', { schema: listBody, signal })).engagements,
  });

export const engagementQuery = (id: number) =>
  queryOptions({
    queryKey: engagementKeys.detail(id),
    queryFn: async ({ signal }) => (await api(`/api/engagements/${id}`, { schema: detailBody, signal })).engagement,
  });

export const engagementMembersQuery = (id: number) =>
  queryOptions({
    queryKey: engagementKeys.members(id),
    queryFn: async ({ signal }) => (await api(`/api/engagements/${id}/members`, { schema: membersBody, signal })).members,
  });
