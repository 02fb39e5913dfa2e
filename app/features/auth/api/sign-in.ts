// POST /api/auth/login: signs in with e-mail and password.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { api } from '../../../lib/api-client';
import { loginBody, sessionSchema, type Session } from '../../../../shared/api/schemas';
import { replaceSession } from './replace-session';

export type SignInInput = z.input<typeof loginBody>;

export function signIn(input: SignInInput): Promise<Session> {
  return api.post('/auth/login', loginBody.parse(input), sessionSchema);
}

export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signIn,
    onSuccess: (session) => replaceSession(queryClient, session),
  });
}
