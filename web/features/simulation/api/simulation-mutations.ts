import { useMutation, useQueryClient } from '@tanstack/react-query';
import { simulationJobBodySchema, type SimulationJobRequest } from '#shared/queue/sim/from-spec-job';
import { api } from '../../../lib/api-client';
import { simulationKeys } from './simulation-keys';

/** Starts a check on the server (202 with the running job), seeding the cache so polling starts at once. */
export function useStartSimulation() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async (body: SimulationJobRequest) => (await api('/api/simulations', { method: 'POST', body, schema: simulationJobBodySchema })).job,
    onSuccess: (job) => qc.setQueryData(simulationKeys.job(job.id), job),
  });
}

/** Cancels a running check; the answer (status cancelled, or the finished job) replaces the cached one. */
export function useCancelSimulation() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async (id: string) =>
      (await api(`/api/simulations/${encodeURIComponent(id)}`, { method: 'DELETE', schema: simulationJobBodySchema })).job,
    onSuccess: (job) => qc.setQueryData(simulationKeys.job(job.id), job),
  });
}
