// PATCH /api/projects/:projectId: rename, describe, archive or restore (owners only).
import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { api } from '../../../lib/api-client';
import { projectSchema, updateProjectBody, type Project } from '../../../../shared/api/schemas';
import { getProjectQueryOptions } from './get-project';
import { projectsQueryKey } from './get-projects';

export type UpdateProjectInput = z.input<typeof updateProjectBody>;

export function updateProject(projectId: number, input: UpdateProjectInput): Promise<Project> {
  return api.patch(`/projects/${projectId}`, updateProjectBody.parse(input), projectSchema);
}

export function useUpdateProject(projectId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: UpdateProjectInput) => updateProject(projectId, input),
    onSuccess: (project) => {
      queryClient.setQueryData(getProjectQueryOptions(project.id).queryKey, project);
      return queryClient.invalidateQueries({ queryKey: projectsQueryKey });
    },
  });
}
