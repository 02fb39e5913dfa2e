// POST /api/projects/:projectId/exports: queues an export run of all, the approved, or the chosen
// figures in the chosen formats (any member). Answers 202 with the queued run.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { api } from '../../../lib/api-client';
import { createExportBody, exportRunSchema, type ExportRun } from '../../../../shared/api/schemas';
import { getExportRunQueryOptions } from './get-export-run';
import { getExportRunsQueryOptions } from './get-export-runs';

export type StartExportInput = z.input<typeof createExportBody>;

export function startExport(projectId: number, input: StartExportInput): Promise<ExportRun> {
  return api.post(`/projects/${projectId}/exports`, createExportBody.parse(input), exportRunSchema);
}

export function useStartExport(projectId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: StartExportInput) => startExport(projectId, input),
    onSuccess: (run) => {
      queryClient.setQueryData(getExportRunQueryOptions(run.id).queryKey, run);
      return queryClient.invalidateQueries({
        queryKey: getExportRunsQueryOptions(projectId).queryKey,
      });
    },
  });
}
