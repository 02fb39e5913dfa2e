// POST /api/projects/:projectId/datasets: uploads a CSV of r and R, r²R² or V (editors and owners).
// A refused file answers 422 with every line-numbered problem in error.details.problems.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { datasetSchema, uploadDatasetFields, type Dataset } from '../../../../shared/api/datasets';
import { getDatasetsQueryOptions } from './get-datasets';

export interface UploadDatasetInput {
  file: File;
  name: string;
  rUnit?: string;
  valueUnit?: string;
}

export function uploadDataset(projectId: number, input: UploadDatasetInput): Promise<Dataset> {
  const fields = uploadDatasetFields.parse(input);
  const form = new FormData();
  form.append('name', fields.name);
  if (fields.rUnit) form.append('rUnit', fields.rUnit);
  if (fields.valueUnit) form.append('valueUnit', fields.valueUnit);
  form.append('file', input.file);
  return api.upload(`/projects/${projectId}/datasets`, form, datasetSchema);
}

export function useUploadDataset(projectId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: UploadDatasetInput) => uploadDataset(projectId, input),
    onSuccess: () =>
      queryClient.invalidateQueries({ queryKey: getDatasetsQueryOptions(projectId).queryKey }),
  });
}
