// GET /api/exports/:runId: one export run's progress. Asked again every second while the run is
// queued or running, so its progress bar moves; it stops asking once the run has finished.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { exportRunSchema, type ExportRun } from '../../../../shared/api/schemas';
import { runIsActive } from '../utils/run-progress';
import { exportsQueryKey } from './get-export-runs';

export const RUN_POLL_MS = 1000;

export function getExportRun(runId: number, signal?: AbortSignal): Promise<ExportRun> {
  return api.get(`/exports/${runId}`, exportRunSchema, { signal });
}

export function getExportRunQueryOptions(runId: number) {
  return queryOptions({
    queryKey: [...exportsQueryKey, 'run', runId] as const,
    queryFn: ({ signal }) => getExportRun(runId, signal),
    refetchInterval: (query) =>
      query.state.data && runIsActive(query.state.data) ? RUN_POLL_MS : false,
  });
}

/** `known` is the run as the list gave it, shown until the first answer of its own. */
export function useExportRun(runId: number, known?: ExportRun) {
  return useQuery({ ...getExportRunQueryOptions(runId), initialData: known });
}
