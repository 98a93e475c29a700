/** Query keys for studies and the assumptions their blocks link to; mutations invalidate by prefix. */
export const studyKeys = {
  all: ['studies'] as const,
  details: () => [...studyKeys.all, 'detail'] as const,
  detail: (id: number) => [...studyKeys.details(), id] as const,
  assumptions: (engagementId: number) => ['engagements', 'detail', engagementId, 'assumptions'] as const,
};
