// GET /api/figures/:figureId: one figure at its latest revision, spec included.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { figureSchema, type Figure } from '../../../../shared/api/schemas';
import { figuresQueryKey } from './get-figures';

export function getFigure(figureId: number, signal?: AbortSignal): Promise<Figure> {
  return api.get(`/figures/${figureId}`, figureSchema, { signal });
}

export function getFigureQueryOptions(figureId: number) {
  return queryOptions({
    queryKey: [...figuresQueryKey, 'detail', figureId] as const,
    queryFn: ({ signal }) => getFigure(figureId, signal),
  });
}

export function useFigure(figureId: number) {
  return useQuery(getFigureQueryOptions(figureId));
}
