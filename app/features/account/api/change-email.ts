// POST /api/account/email: asks for a new address; a confirmation link goes to that address and
// nothing changes until it is opened (202 Accepted, no body).
import { useMutation } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '../../../lib/api-client';
import { changeEmailBody } from '../../../../shared/api/schemas';

export type ChangeEmailInput = z.input<typeof changeEmailBody>;

export async function changeEmail(input: ChangeEmailInput): Promise<void> {
  // 202 carries nothing the client needs; any body is accepted and ignored.
  await api.post('/account/email', changeEmailBody.parse(input), z.unknown());
}

export function useChangeEmail() {
  return useMutation({ mutationFn: changeEmail });
}
