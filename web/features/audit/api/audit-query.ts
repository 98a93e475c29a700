import { infiniteQueryOptions } from '@tanstack/react-query';
import { z } from 'zod';
import { auditEntrySchema } from '#shared/schemas/audit';
import { api } from '../../../lib/api-client';
import { auditKeys } from './audit-keys';
import { toAuditQuery, type AuditFilters } from './audit-filters';

const PAGE_SIZE = 50;
const pageSchema = z.object({ entries: z.array(auditEntrySchema), nextBeforeId: z.number().int().nullable() });

/** Newest first; each further page continues below the oldest entry seen (beforeId). */
export const auditQuery = (filters: AuditFilters) =>
  infiniteQueryOptions({
    queryKey: auditKeys.list(filters),
    queryFn: ({ pageParam, signal }) =>
      api('/api/audit', { query: { ...toAuditQuery(filters), limit: PAGE_SIZE, beforeId: pageParam }, schema: pageSchema, signal }),
    initialPageParam: undefined as number | undefined,
    getNextPageParam: (last) => last.nextBeforeId ?? undefined,
    staleTime: 0,
  });
