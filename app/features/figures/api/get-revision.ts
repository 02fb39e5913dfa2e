// GET /api/figures/:figureId/revisions/:revision: one saved revision in full. Revisions never
// change once saved, so a fetched one stays fresh for good.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { revisionSchema, type Revision } from '../../../../shared/api/schemas';
import { getRevisionsQueryOptions } from './get-revisions';

export function getRevision(
  figureId: number,
  revision: number,
  signal?: AbortSignal,
): Promise<Revision> {
  return api.get(`/figures/${figureId}/revisions/${revision}`, revisionSchema, { signal });
}

export function getRevisionQueryOptions(figureId: number, revision: number) {
  return queryOptions({
    queryKey: [...getRevisionsQueryOptions(figureId).queryKey, revision] as const,
    queryFn: ({ signal }) => getRevision(figureId, revision, signal),
    staleTime: Infinity,
  });
}

export function useRevision(figureId: number, revision: number) {
  return useQuery(getRevisionQueryOptions(figureId, revision));
}
