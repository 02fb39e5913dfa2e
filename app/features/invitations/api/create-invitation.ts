// POST /api/projects/:projectId/invitations: mails a single-use link that adds the address to the
// project with a role (owners only; 409 already_member when the address is a member already).
import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { api } from '../../../lib/api-client';
import {
  createInvitationBody,
  invitationSchema,
  type Invitation,
} from '../../../../shared/api/schemas';
import { getInvitationsQueryOptions } from './get-invitations';

export type CreateInvitationInput = z.input<typeof createInvitationBody>;

export function createInvitation(
  projectId: number,
  input: CreateInvitationInput,
): Promise<Invitation> {
  return api.post(
    `/projects/${projectId}/invitations`,
    createInvitationBody.parse(input),
    invitationSchema,
  );
}

export function useCreateInvitation(projectId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateInvitationInput) => createInvitation(projectId, input),
    onSuccess: () =>
      queryClient.invalidateQueries({ queryKey: getInvitationsQueryOptions(projectId).queryKey }),
  });
}
