// POST /api/projects/:projectId/figures/bulk: submits or deletes several figures at once (editors
// and owners). Figures that cannot take the action are skipped, each with the reason.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '../../../lib/api-client';
import { bulkFigureBody } from '../../../../shared/api/schemas';
import { figuresQueryKey } from './get-figures';

export type BulkFigureInput = z.input<typeof bulkFigureBody>;

const bulkResultSchema = z.object({
  done: z.array(z.number()),
  skipped: z.array(z.object({ id: z.number(), reason: z.string() })),
});
export type BulkResult = z.infer<typeof bulkResultSchema>;

export function bulkFigureAction(projectId: number, input: BulkFigureInput): Promise<BulkResult> {
  return api.post(
    `/projects/${projectId}/figures/bulk`,
    bulkFigureBody.parse(input),
    bulkResultSchema,
  );
}

export function useBulkFigureAction(projectId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: BulkFigureInput) => bulkFigureAction(projectId, input),
    // Statuses and membership of the list changed, and so did any open figure among them.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: figuresQueryKey }),
  });
}
