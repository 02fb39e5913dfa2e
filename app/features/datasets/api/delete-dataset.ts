// DELETE /api/datasets/:datasetId (editors and owners); refused with 409 while a figure draws it.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { getDatasetsQueryOptions } from './get-datasets';

export function deleteDataset(datasetId: number): Promise<void> {
  return api.delete(`/datasets/${datasetId}`);
}

export function useDeleteDataset(projectId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteDataset,
    onSuccess: () =>
      queryClient.invalidateQueries({ queryKey: getDatasetsQueryOptions(projectId).queryKey }),
  });
}
