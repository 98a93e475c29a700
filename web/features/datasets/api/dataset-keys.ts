/** Query keys of datasets; the list sits under its engagement so invalidating that refreshes it. */
export const datasetKeys = {
  all: ['datasets'] as const,
  forEngagement: (engagementId: number) => ['engagements', 'detail', engagementId, 'datasets'] as const,
  detail: (id: number) => ['datasets', 'detail', id] as const,
  fit: (id: number) => ['datasets', 'detail', id, 'fit'] as const,
};
