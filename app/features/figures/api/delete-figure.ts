// DELETE /api/figures/:figureId: removes a figure and its revisions (editors and owners).
// The figure's own cache entries are left to expire: the page showing it navigates away, and
// dropping them while it is still mounted would only make it fetch a figure that is gone.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { getFiguresQueryOptions } from './get-figures';

export function deleteFigure(figureId: number): Promise<void> {
  return api.delete(`/figures/${figureId}`);
}

export function useDeleteFigure(projectId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteFigure,
    onSuccess: () =>
      queryClient.invalidateQueries({ queryKey: getFiguresQueryOptions(projectId).queryKey }),
  });
}
