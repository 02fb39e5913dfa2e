// GET /api/figures/:figureId/revisions: every saved revision of a figure, newest first as the server sends them.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '../../../lib/api-client';
import { revisionSummarySchema, type RevisionSummary } from '../../../../shared/api/schemas';
import { figuresQueryKey } from './get-figures';

export function getRevisions(figureId: number, signal?: AbortSignal): Promise<RevisionSummary[]> {
  return api.get(`/figures/${figureId}/revisions`, z.array(revisionSummarySchema), { signal });
}

export function getRevisionsQueryOptions(figureId: number) {
  return queryOptions({
    queryKey: [...figuresQueryKey, 'revisions', figureId] as const,
    queryFn: ({ signal }) => getRevisions(figureId, signal),
  });
}

export function useRevisions(figureId: number) {
  return useQuery(getRevisionsQueryOptions(figureId));
}
