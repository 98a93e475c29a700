/**
 * Query keys for an engagement's studies and the template catalogue. The list hangs under the
 * engagement's detail key, so invalidating an engagement refreshes its studies too.
 */
export const studyListKeys = {
  forEngagement: (engagementId: number) => ['engagements', 'detail', engagementId, 'studies'] as const,
  templates: () => ['templates'] as const,
};
