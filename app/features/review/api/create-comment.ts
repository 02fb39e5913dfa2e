// POST /api/figures/:figureId/comments: a new comment (on the current revision) or a reply (kept
// in its parent's revision). Reviewers, editors and owners.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { api } from '../../../lib/api-client';
import { commentSchema, createCommentBody, type Comment } from '../../../../shared/api/schemas';
import { getCommentsQueryOptions } from './get-comments';

export type CreateCommentInput = z.input<typeof createCommentBody>;

export function createComment(figureId: number, input: CreateCommentInput): Promise<Comment> {
  return api.post(`/figures/${figureId}/comments`, createCommentBody.parse(input), commentSchema);
}

export function useCreateComment(figureId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateCommentInput) => createComment(figureId, input),
    onSuccess: () =>
      queryClient.invalidateQueries({ queryKey: getCommentsQueryOptions(figureId).queryKey }),
  });
}
