// GET /api/projects/:projectId/house-style: the look and print settings figures inherit, with
// the product defaults filled in where the project sets nothing.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { houseStyleSchema, type HouseStyle } from '../../../../shared/spec/house-style';

export function getHouseStyle(projectId: number, signal?: AbortSignal): Promise<HouseStyle> {
  return api.get(`/projects/${projectId}/house-style`, houseStyleSchema, { signal });
}

export function getHouseStyleQueryOptions(projectId: number) {
  return queryOptions({
    queryKey: ['house-style', projectId] as const,
    queryFn: ({ signal }) => getHouseStyle(projectId, signal),
  });
}

export function useHouseStyle(projectId: number) {
  return useQuery(getHouseStyleQueryOptions(projectId));
}
