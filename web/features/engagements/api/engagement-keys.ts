/** Query keys for engagements; mutations invalidate by prefix (all, or one detail and its members). */
export const engagementKeys = {
  all: ['engagements'] as const,
  lists: () => [...engagementKeys.all, 'list'] as const,
  list: () => [...engagementKeys.lists(), {}] as const,
  details: () => [...engagementKeys.all, 'detail'] as const,
  detail: (id: number) => [...engagementKeys.details(), id] as const,
  members: (id: number) => [...engagementKeys.detail(id), 'members'] as const,
};
