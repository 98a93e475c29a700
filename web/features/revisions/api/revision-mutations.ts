import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CreateComment, Decision } from '#shared/schemas/revisions';
import { api } from '../../../lib/api-client';
import { commentBody, revisionRefBody } from './revision-bodies';
import { revisionKeys } from './revision-keys';

/**
 * Submits the study's saved text as its next revision. `studyVersion` is the version the author
 * saw, so a save by someone else in between answers 409 instead of submitting unseen text.
 */
export function useSubmitRevision(studyId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async (studyVersion: number | undefined) =>
      (await api(`/api/studies/${studyId}/revisions`, { method: 'POST', body: { studyVersion }, schema: revisionRefBody })).revision,
    // Not the open study itself: the editor owns it and reloads it (now read-only) once the
    // author has read the outcome; refetching it here would unmount the outcome dialog.
    onSuccess: () => Promise.all([qc.invalidateQueries({ queryKey: revisionKeys.all }), qc.invalidateQueries({ queryKey: ['engagements'] })]),
  });
}

/** After a decision or a release every list changes (queue, study list, deliverables) and so does the study. */
function useRefreshAfter() {
  const qc = useQueryClient();
  return () => Promise.all([qc.invalidateQueries({ queryKey: revisionKeys.all }), qc.invalidateQueries({ queryKey: ['studies'] }), qc.invalidateQueries({ queryKey: ['engagements'] })]);
}

export function useDecideRevision(id: number) {
  const refresh = useRefreshAfter();
  return useMutation({
    mutationFn: async (decision: Decision) => (await api(`/api/revisions/${id}/decision`, { method: 'POST', body: decision, schema: revisionRefBody })).revision,
    onSuccess: refresh,
  });
}

/** Renders, signs and stores the PDF; can take some seconds, and may fail with the server's reason. */
export function useReleaseRevision(id: number) {
  const refresh = useRefreshAfter();
  return useMutation({
    mutationFn: async () => (await api(`/api/revisions/${id}/release`, { method: 'POST', schema: revisionRefBody })).revision,
    onSettled: refresh,
  });
}

export function useAddComment(revisionId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async (body: Partial<CreateComment> & { body: string }) =>
      (await api(`/api/revisions/${revisionId}/comments`, { method: 'POST', body, schema: commentBody })).comment,
    onSuccess: () => qc.invalidateQueries({ queryKey: revisionKeys.detail(revisionId) }),
  });
}

export function useResolveComment(revisionId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async ({ id, resolved }: { id: number; resolved: boolean }) =>
      (await api(`/api/comments/${id}`, { method: 'PATCH', body: { resolved }, schema: commentBody })).comment,
    onSuccess: () => qc.invalidateQueries({ queryKey: revisionKeys.detail(revisionId) }),
  });
}
