/**
 * The register's query key. It is the key the study editor reads the register under too, so an
 * edit here refreshes the editor's link pickers, and invalidating an engagement refreshes both.
 */
export const assumptionKeys = {
  forEngagement: (engagementId: number) => ['engagements', 'detail', engagementId, 'assumptions'] as const,
  /** Block time units of a study, read to put units on the numbers an edit moved. */
  blockUnits: (studyId: number) => ['assumptions', 'block-units', studyId] as const,
};
