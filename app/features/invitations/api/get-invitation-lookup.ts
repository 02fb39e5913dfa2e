// GET /api/invitations/lookup?token=…: what an invitation link offers, for the person who opened it
// (public; 404 invalid_token, 410 expired, 409 already_used or withdrawn).
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import {
  invitationLookupSchema,
  tokenSchema,
  type InvitationLookup,
} from '../../../../shared/api/schemas';

export function getInvitationLookup(token: string, signal?: AbortSignal): Promise<InvitationLookup> {
  return api.get('/invitations/lookup', invitationLookupSchema, {
    query: { token: tokenSchema.parse(token) },
    signal,
  });
}

export function getInvitationLookupQueryOptions(token: string) {
  return queryOptions({
    queryKey: ['invitation-lookup', token] as const,
    queryFn: ({ signal }) => getInvitationLookup(token, signal),
    // Whether the link still works can change (withdrawn, used in another tab): ask each visit.
    staleTime: 0,
  });
}

export function useInvitationLookup(token: string) {
  return useQuery(getInvitationLookupQueryOptions(token));
}
