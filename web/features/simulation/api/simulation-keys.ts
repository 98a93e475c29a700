/** Query keys for simulation checks; one entry per job, updated by polling and by the mutations. */
export const simulationKeys = {
  all: ['simulations'] as const,
  jobs: () => [...simulationKeys.all, 'job'] as const,
  job: (id: string | null) => [...simulationKeys.jobs(), id] as const,
};
