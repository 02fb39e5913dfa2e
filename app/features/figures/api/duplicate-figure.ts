// POST /api/figures/:figureId/duplicate: copies a figure (latest revision) within its project.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { figureSchema, type Figure } from '../../../../shared/api/schemas';
import { getFigureQueryOptions } from './get-figure';
import { getFiguresQueryOptions } from './get-figures';

export function duplicateFigure(figureId: number): Promise<Figure> {
  return api.post(`/figures/${figureId}/duplicate`, {}, figureSchema);
}

export function useDuplicateFigure(projectId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: duplicateFigure,
    onSuccess: (copy) => {
      queryClient.setQueryData(getFigureQueryOptions(copy.id).queryKey, copy);
      return queryClient.invalidateQueries({
        queryKey: getFiguresQueryOptions(projectId).queryKey,
      });
    },
  });
}
