// POST /api/auth/password-reset/confirm: sets the new password from a reset link and signs in.
// The answer is the new session (and CSRF token), which the caller must store.
import { useMutation } from '@tanstack/react-query';
import type { z } from 'zod';
import { api } from '../../../lib/api-client';
import {
  passwordResetConfirmBody,
  sessionSchema,
  type Session,
} from '../../../../shared/api/schemas';

export type PasswordResetConfirmInput = z.input<typeof passwordResetConfirmBody>;

export function confirmPasswordReset(input: PasswordResetConfirmInput): Promise<Session> {
  return api.post('/auth/password-reset/confirm', passwordResetConfirmBody.parse(input), sessionSchema);
}

export function useConfirmPasswordReset() {
  return useMutation({ mutationFn: confirmPasswordReset });
}
