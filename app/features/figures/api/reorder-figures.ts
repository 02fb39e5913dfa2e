// PUT /api/projects/:projectId/figures/order: the project's whole figure list in its new order, each
// figure with its number, saved at once (editors and owners). The answer is the reordered list.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '../../../lib/api-client';
import {
  figureOrderBody,
  figureSummarySchema,
  type FigureSummary,
} from '../../../../shared/api/schemas';
import { getFiguresQueryOptions } from './get-figures';

export type FigureOrderInput = z.input<typeof figureOrderBody>;

export function reorderFigures(
  projectId: number,
  input: FigureOrderInput,
): Promise<FigureSummary[]> {
  return api.put(
    `/projects/${projectId}/figures/order`,
    figureOrderBody.parse(input),
    z.array(figureSummarySchema),
  );
}

export function useReorderFigures(projectId: number) {
  const queryClient = useQueryClient();
  const { queryKey } = getFiguresQueryOptions(projectId);
  return useMutation({
    mutationFn: (input: FigureOrderInput) => reorderFigures(projectId, input),
    onSuccess: (figures) => queryClient.setQueryData(queryKey, figures),
    // Someone may have added or removed a figure meanwhile (422 incomplete_order): show the list as it is.
    onError: () => queryClient.invalidateQueries({ queryKey }),
  });
}
