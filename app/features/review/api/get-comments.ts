// GET /api/figures/:figureId/comments: every comment on a figure, oldest first, each kept with the
// revision it was written about.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '../../../lib/api-client';
import { commentSchema, type Comment } from '../../../../shared/api/schemas';

/** Every review query starts with this key. */
export const reviewQueryKey = ['review'] as const;

export function getComments(figureId: number, signal?: AbortSignal): Promise<Comment[]> {
  return api.get(`/figures/${figureId}/comments`, z.array(commentSchema), { signal });
}

export function getCommentsQueryOptions(figureId: number) {
  return queryOptions({
    queryKey: [...reviewQueryKey, 'comments', figureId] as const,
    queryFn: ({ signal }) => getComments(figureId, signal),
  });
}

export function useComments(figureId: number) {
  return useQuery(getCommentsQueryOptions(figureId));
}
