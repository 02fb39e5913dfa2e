// GET /api/projects/:projectId: one project and the signed-in user's role in it.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { projectSchema, type Project } from '../../../../shared/api/schemas';
import { projectsQueryKey } from './get-projects';

export function getProject(projectId: number, signal?: AbortSignal): Promise<Project> {
  return api.get(`/projects/${projectId}`, projectSchema, { signal });
}

export function getProjectQueryOptions(projectId: number) {
  return queryOptions({
    queryKey: [...projectsQueryKey, 'detail', projectId] as const,
    queryFn: ({ signal }) => getProject(projectId, signal),
  });
}

export function useProject(projectId: number) {
  return useQuery(getProjectQueryOptions(projectId));
}
