// POST /api/invitations/accept: joins the project, creating the account first when the invited
// address has none. The answer carries the new session (and CSRF token) the caller must store.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { api } from '../../../lib/api-client';
import {
  acceptInvitationBody,
  acceptInvitationResultSchema,
} from '../../../../shared/api/schemas';
import { getInvitationLookupQueryOptions } from './get-invitation-lookup';

export type AcceptInvitationInput = z.input<typeof acceptInvitationBody>;
export type AcceptInvitationResult = z.output<typeof acceptInvitationResultSchema>;

export function acceptInvitation(input: AcceptInvitationInput): Promise<AcceptInvitationResult> {
  return api.post('/invitations/accept', acceptInvitationBody.parse(input), acceptInvitationResultSchema);
}

export function useAcceptInvitation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: acceptInvitation,
    // The link is used up now; a later look-up must ask the server again.
    onSuccess: (_result, input) =>
      queryClient.removeQueries({ queryKey: getInvitationLookupQueryOptions(input.token).queryKey }),
  });
}
