// POST /api/figures/:figureId/copy { projectId }: copies the figure's current revision (with the
// data sets it draws) into another project; the caller must be an editor or owner of both.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { copyFigureBody } from '../../../../shared/api/bundle';
import { figureSchema, type Figure } from '../../../../shared/api/schemas';
import { figuresQueryKey } from './get-figures';

export function copyFigure(figureId: number, projectId: number): Promise<Figure> {
  return api.post(`/figures/${figureId}/copy`, copyFigureBody.parse({ projectId }), figureSchema);
}

export function useCopyFigure(figureId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (projectId: number) => copyFigure(figureId, projectId),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: figuresQueryKey }),
  });
}
