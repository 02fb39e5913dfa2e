// POST /api/auth/signup: creates an account and signs it in (403 signup_disabled when closed).
import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { api } from '../../../lib/api-client';
import { sessionSchema, signupBody, type Session } from '../../../../shared/api/schemas';
import { replaceSession } from './replace-session';

export type SignUpInput = z.input<typeof signupBody>;

export function signUp(input: SignUpInput): Promise<Session> {
  return api.post('/auth/signup', signupBody.parse(input), sessionSchema);
}

export function useSignUp() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signUp,
    onSuccess: (session) => replaceSession(queryClient, session),
  });
}
