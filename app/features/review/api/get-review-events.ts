// GET /api/figures/:figureId/review: the figure's status changes, oldest first, with who, when,
// which revision and the note given.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '../../../lib/api-client';
import { reviewEventSchema, type ReviewEvent } from '../../../../shared/api/schemas';
import { reviewQueryKey } from './get-comments';

export function getReviewEvents(figureId: number, signal?: AbortSignal): Promise<ReviewEvent[]> {
  return api.get(`/figures/${figureId}/review`, z.array(reviewEventSchema), { signal });
}

export function getReviewEventsQueryOptions(figureId: number) {
  return queryOptions({
    queryKey: [...reviewQueryKey, 'events', figureId] as const,
    queryFn: ({ signal }) => getReviewEvents(figureId, signal),
  });
}

export function useReviewEvents(figureId: number) {
  return useQuery(getReviewEventsQueryOptions(figureId));
}
