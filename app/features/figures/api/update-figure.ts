// PUT /api/figures/:figureId: saves a new revision on top of `baseRevision`. When someone else
// saved in between, the server answers 409 stale_revision naming the current revision.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { api, isApiError } from '../../../lib/api-client';
import { figureSchema, updateFigureBody, type Figure } from '../../../../shared/api/schemas';
import { getFigureQueryOptions } from './get-figure';
import { getFiguresQueryOptions } from './get-figures';
import { getRevisionsQueryOptions } from './get-revisions';

export type UpdateFigureInput = z.input<typeof updateFigureBody>;

export function updateFigure(figureId: number, input: UpdateFigureInput): Promise<Figure> {
  return api.put(`/figures/${figureId}`, updateFigureBody.parse(input), figureSchema);
}

/** The revision a stale_revision error names, if its message names one. */
export function currentRevisionFromConflict(error: unknown): number | null {
  if (!isApiError(error, 'stale_revision')) return null;
  const match = /revision\D{0,3}(\d+)/i.exec(error.message);
  return match ? Number(match[1]) : null;
}

export function useUpdateFigure(figureId: number, projectId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: UpdateFigureInput) => updateFigure(figureId, input),
    onSuccess: (figure) => {
      queryClient.setQueryData(getFigureQueryOptions(figureId).queryKey, figure);
      return Promise.all([
        queryClient.invalidateQueries({ queryKey: getFiguresQueryOptions(projectId).queryKey }),
        queryClient.invalidateQueries({
          queryKey: getRevisionsQueryOptions(figureId).queryKey,
          exact: true,
        }),
      ]);
    },
    onError: (error) => {
      // Someone else's revision is now the latest: fetch it so the page can offer it.
      if (isApiError(error, 'stale_revision'))
        return queryClient.invalidateQueries({
          queryKey: getFigureQueryOptions(figureId).queryKey,
        });
    },
  });
}
