// POST /api/projects: creates a project with the signed-in user as its owner.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { api } from '../../../lib/api-client';
import { createProjectBody, projectSchema, type Project } from '../../../../shared/api/schemas';
import { getProjectQueryOptions } from './get-project';
import { projectsQueryKey } from './get-projects';

export type CreateProjectInput = z.input<typeof createProjectBody>;

export function createProject(input: CreateProjectInput): Promise<Project> {
  return api.post('/projects', createProjectBody.parse(input), projectSchema);
}

export function useCreateProject() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createProject,
    onSuccess: (project) => {
      queryClient.setQueryData(getProjectQueryOptions(project.id).queryKey, project);
      return queryClient.invalidateQueries({ queryKey: projectsQueryKey });
    },
  });
}
