// POST /api/auth/password-reset: mails a single-use reset link if an account has the address.
// The answer is 202 either way, so the page cannot tell anyone which addresses have accounts.
import { useMutation } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '../../../lib/api-client';
import { passwordResetRequestBody } from '../../../../shared/api/schemas';

export type PasswordResetRequestInput = z.input<typeof passwordResetRequestBody>;

export async function requestPasswordReset(input: PasswordResetRequestInput): Promise<void> {
  await api.post('/auth/password-reset', passwordResetRequestBody.parse(input), z.unknown());
}

export function useRequestPasswordReset() {
  return useMutation({ mutationFn: requestPasswordReset });
}
