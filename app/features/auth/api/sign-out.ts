// POST /api/auth/logout: ends the session; the answer is the signed-out session.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { sessionSchema, type Session } from '../../../../shared/api/schemas';
import { replaceSession } from './replace-session';

export function signOut(): Promise<Session> {
  return api.post('/auth/logout', {}, sessionSchema);
}

export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signOut,
    onSuccess: (session) => replaceSession(queryClient, session),
  });
}
