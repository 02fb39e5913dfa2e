// POST /api/projects/:projectId/figures: adds a figure (editors and owners).
import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { api } from '../../../lib/api-client';
import { createFigureBody, figureSchema, type Figure } from '../../../../shared/api/schemas';
import { getFigureQueryOptions } from './get-figure';
import { getFiguresQueryOptions } from './get-figures';

export type CreateFigureInput = z.input<typeof createFigureBody>;

export function createFigure(projectId: number, input: CreateFigureInput): Promise<Figure> {
  return api.post(`/projects/${projectId}/figures`, createFigureBody.parse(input), figureSchema);
}

export function useCreateFigure(projectId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateFigureInput) => createFigure(projectId, input),
    onSuccess: (figure) => {
      queryClient.setQueryData(getFigureQueryOptions(figure.id).queryKey, figure);
      return queryClient.invalidateQueries({
        queryKey: getFiguresQueryOptions(projectId).queryKey,
      });
    },
  });
}
