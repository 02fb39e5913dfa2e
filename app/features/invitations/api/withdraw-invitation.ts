// DELETE /api/invitations/:invitationId: withdraws an invitation; its link stops working.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { getInvitationsQueryOptions } from './get-invitations';

export function withdrawInvitation(invitationId: number): Promise<void> {
  return api.delete(`/invitations/${invitationId}`);
}

export function useWithdrawInvitation(projectId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: withdrawInvitation,
    onSettled: () =>
      queryClient.invalidateQueries({ queryKey: getInvitationsQueryOptions(projectId).queryKey }),
  });
}
