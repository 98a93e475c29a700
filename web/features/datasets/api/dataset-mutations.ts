import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { assumptionSchema } from '#shared/schemas/assumptions';
import { datasetSchema, type CreateDatasetAssumptions, type DatasetMapping, type StaffingBlockRequest } from '#shared/schemas/datasets';
import { api } from '../../../lib/api-client';
import { uploadFile } from '../../../lib/upload-file';
import { datasetKeys } from './dataset-keys';

const detailBody = z.object({ dataset: datasetSchema });

export function useUploadDataset(engagementId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async ({ file, onProgress }: { file: File; onProgress: (share: number) => void }) =>
      detailBody.parse(await uploadFile(`/api/engagements/${engagementId}/datasets`, 'file', file, onProgress)).dataset,
    onSuccess: () => qc.invalidateQueries({ queryKey: datasetKeys.forEngagement(engagementId) }),
  });
}

export function useSaveMapping(id: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async (mapping: DatasetMapping) => (await api(`/api/datasets/${id}/mapping`, { method: 'PUT', body: mapping, schema: detailBody })).dataset,
    onSuccess: (d) => {
      qc.setQueryData(datasetKeys.detail(id), d);
      return qc.invalidateQueries({ queryKey: datasetKeys.detail(id) });
    },
  });
}

export function useCreateDatasetAssumptions(id: number, engagementId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async (body: CreateDatasetAssumptions) => (await api(`/api/datasets/${id}/assumptions`, { method: 'POST', body, schema: z.object({ assumptions: z.array(assumptionSchema) }) })).assumptions,
    onSuccess: () => qc.invalidateQueries({ queryKey: ['engagements', 'detail', engagementId] }),
  });
}

export function useAddStaffingBlock(id: number) {
  return useMutation({
    mutationFn: async (body: StaffingBlockRequest) => api(`/api/datasets/${id}/staffing-block`, { method: 'POST', body, schema: z.object({ studyId: z.number(), blockId: z.string(), version: z.number() }) }),
  });
}
