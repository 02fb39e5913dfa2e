// GET /api/projects/:projectId/figures: the figures of one project, without their specs.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '../../../lib/api-client';
import { figureSummarySchema, type FigureSummary } from '../../../../shared/api/schemas';

/** Every figure query starts with this key. */
export const figuresQueryKey = ['figures'] as const;

export function getFigures(projectId: number, signal?: AbortSignal): Promise<FigureSummary[]> {
  return api.get(`/projects/${projectId}/figures`, z.array(figureSummarySchema), { signal });
}

export function getFiguresQueryOptions(projectId: number) {
  return queryOptions({
    queryKey: [...figuresQueryKey, 'list', projectId] as const,
    queryFn: ({ signal }) => getFigures(projectId, signal),
  });
}

export function useFigures(projectId: number) {
  return useQuery(getFiguresQueryOptions(projectId));
}
