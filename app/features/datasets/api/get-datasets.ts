// GET /api/projects/:projectId/datasets: the project's uploaded radial data sets, without their points.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '../../../lib/api-client';
import { datasetSummarySchema, type DatasetSummary } from '../../../../shared/api/datasets';

/** Every data set query starts with this key. */
export const datasetsQueryKey = ['datasets'] as const;

export function getDatasets(projectId: number, signal?: AbortSignal): Promise<DatasetSummary[]> {
  return api.get(`/projects/${projectId}/datasets`, z.array(datasetSummarySchema), { signal });
}

export function getDatasetsQueryOptions(projectId: number) {
  return queryOptions({
    queryKey: [...datasetsQueryKey, 'list', projectId] as const,
    queryFn: ({ signal }) => getDatasets(projectId, signal),
  });
}

export function useDatasets(projectId: number) {
  return useQuery(getDatasetsQueryOptions(projectId));
}
