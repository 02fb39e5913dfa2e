// POST /api/invitations/:invitationId/resend: mails a new link and renews the expiry (the old
// link stops working).
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { invitationSchema, type Invitation } from '../../../../shared/api/schemas';
import { getInvitationsQueryOptions } from './get-invitations';

export function resendInvitation(invitationId: number): Promise<Invitation> {
  return api.post(`/invitations/${invitationId}/resend`, {}, invitationSchema);
}

export function useResendInvitation(projectId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: resendInvitation,
    onSettled: () =>
      queryClient.invalidateQueries({ queryKey: getInvitationsQueryOptions(projectId).queryKey }),
  });
}
