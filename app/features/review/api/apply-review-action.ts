// POST /api/figures/:figureId/review: submit for review (editors), request changes (with a note)
// or approve (reviewers and up). Answers the figure with its new status; 409 invalid_transition
// when the figure's status no longer allows the action (someone else acted first).
import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { api, isApiError } from '../../../lib/api-client';
import { figureSchema, reviewActionBody, type Figure } from '../../../../shared/api/schemas';
import { getReviewEventsQueryOptions } from './get-review-events';

export type ReviewActionInput = z.input<typeof reviewActionBody>;

export function applyReviewAction(figureId: number, input: ReviewActionInput): Promise<Figure> {
  return api.post(`/figures/${figureId}/review`, reviewActionBody.parse(input), figureSchema);
}

/**
 * `onFigure` receives the figure after a change, and is called with null after a 409, so that the
 * caller refreshes whatever shows the figure's status.
 */
export function useApplyReviewAction(figureId: number, onFigure: (figure: Figure | null) => void) {
  const queryClient = useQueryClient();
  const refreshHistory = () =>
    queryClient.invalidateQueries({ queryKey: getReviewEventsQueryOptions(figureId).queryKey });
  return useMutation({
    mutationFn: (input: ReviewActionInput) => applyReviewAction(figureId, input),
    onSuccess: (figure) => {
      onFigure(figure);
      return refreshHistory();
    },
    onError: (error) => {
      if (!isApiError(error) || error.status !== 409) return;
      onFigure(null);
      return refreshHistory();
    },
  });
}
