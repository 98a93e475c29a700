import { queryOptions, skipToken } from '@tanstack/react-query';
import { simulationJobBodySchema } from '#shared/queue/sim/from-spec-job';
import { api } from '../../../lib/api-client';
import { simulationKeys } from './simulation-keys';

/** How often a running job is polled; a check lasts one to three seconds. */
export const POLL_MS = 300;

/**
 * One simulation job. Polled while it runs and never again once it has finished (its state can
 * no longer change, and the server forgets it after ten minutes). Disabled while `id` is null.
 */
export const simulationJobQuery = (id: string | null) =>
  queryOptions({
    queryKey: simulationKeys.job(id),
    queryFn: id === null ? skipToken : async ({ signal }) => (await api(`/api/simulations/${encodeURIComponent(id)}`, { schema: simulationJobBodySchema, signal })).job,
    staleTime: Infinity,
    refetchInterval: (query) => (query.state.data?.status === 'running' ? POLL_MS : false),
  });
