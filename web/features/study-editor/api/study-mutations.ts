import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { studyDetailSchema, type SaveDocument, type StudyDetail } from '#shared/schemas/studies';
import { api } from '../../../lib/api-client';
import { studyKeys } from './study-keys';

const detailBody = z.object({ study: studyDetailSchema });

/** Saves the document against the version it was based on; 409 when someone saved in between. */
export async function saveStudyDocument(id: number, body: SaveDocument): Promise<StudyDetail> {
  return (await api(`/api/studies/${id}/document`, { method: 'PUT', body, schema: detailBody })).study;
}

/**
 * "Keep my text as a new copy": a new blank study in the same engagement, then my document
 * saved into it, so nothing typed is lost when someone else saved first.
 */
export function useSaveAsCopy() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async ({ engagementId, title, document }: { engagementId: number; title: string; document: SaveDocument['document'] }) => {
      const created = (await api(`/api/engagements/${engagementId}/studies`, { method: 'POST', body: { title, templateKey: null }, schema: detailBody })).study;
      return saveStudyDocument(created.id, { document, baseVersion: created.version, title });
    },
    onSuccess: (study) => {
      qc.setQueryData(studyKeys.detail(study.id), study);
      return qc.invalidateQueries({ queryKey: ['engagements', 'detail', study.engagementId] });
    },
  });
}
