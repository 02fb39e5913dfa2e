// GET /api/projects?archived=…: the projects the signed-in user belongs to, with their role.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '../../../lib/api-client';
import { projectSchema, type Project } from '../../../../shared/api/schemas';

/** Every project query starts with this, so one invalidation refreshes lists and single projects. */
export const projectsQueryKey = ['projects'] as const;

export function getProjects(
  { archived }: { archived: boolean },
  signal?: AbortSignal,
): Promise<Project[]> {
  return api.get('/projects', z.array(projectSchema), {
    query: { archived: String(archived) },
    signal,
  });
}

export function getProjectsQueryOptions({ archived }: { archived: boolean }) {
  return queryOptions({
    queryKey: [...projectsQueryKey, 'list', { archived }] as const,
    // The list shows one kind only, whatever else the server includes.
    queryFn: async ({ signal }) =>
      (await getProjects({ archived }, signal)).filter((p) => p.archived === archived),
  });
}

export function useProjects({ archived }: { archived: boolean }) {
  return useQuery(getProjectsQueryOptions({ archived }));
}
