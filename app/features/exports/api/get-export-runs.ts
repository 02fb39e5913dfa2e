// GET /api/projects/:projectId/exports: the project's export runs, newest first (the last 50).
import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '../../../lib/api-client';
import { exportRunSchema, type ExportRun } from '../../../../shared/api/schemas';

/** Every export query starts with this key. */
export const exportsQueryKey = ['exports'] as const;

export function getExportRuns(projectId: number, signal?: AbortSignal): Promise<ExportRun[]> {
  return api.get(`/projects/${projectId}/exports`, z.array(exportRunSchema), { signal });
}

export function getExportRunsQueryOptions(projectId: number) {
  return queryOptions({
    queryKey: [...exportsQueryKey, 'list', projectId] as const,
    queryFn: ({ signal }) => getExportRuns(projectId, signal),
  });
}

export function useExportRuns(projectId: number) {
  return useQuery(getExportRunsQueryOptions(projectId));
}
