/**
 * Query keys for revisions. Everything hangs under ['revisions'] so a decision or a release can
 * refresh every list (study, review queue, deliverables) by one prefix.
 */
export const revisionKeys = {
  all: ['revisions'] as const,
  forStudy: (studyId: number) => [...revisionKeys.all, 'study', studyId] as const,
  detail: (id: number) => [...revisionKeys.all, 'detail', id] as const,
  comments: (id: number) => [...revisionKeys.all, 'detail', id, 'comments'] as const,
  compare: (from: number, to: number) => [...revisionKeys.all, 'compare', from, to] as const,
  queue: () => [...revisionKeys.all, 'queue'] as const,
  deliverables: () => [...revisionKeys.all, 'deliverables'] as const,
};
