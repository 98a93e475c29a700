import { queryOptions } from '@tanstack/react-query';
import { z } from 'zod';
import { caughtMailSchema } from '#shared/schemas/mailbox';
import { api } from '../../../lib/api-client';
import { mailboxKeys } from './mailbox-keys';

const mailboxBody = z.object({ enabled: z.boolean(), messages: z.array(caughtMailSchema) });

/** Mail the local SMTP fake caught; polled so a new invitation shows without reloading. */
export const mailboxQuery = () =>
  queryOptions({
    queryKey: mailboxKeys.list(),
    queryFn: ({ signal }) => api('/api/admin/mailbox', { schema: mailboxBody, signal }),
    refetchInterval: 5000,
    staleTime: 0,
  });
