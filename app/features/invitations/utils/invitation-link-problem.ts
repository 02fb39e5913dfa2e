// Why an invitation link cannot be used, in words for the person who opened it, from the error
// code of the look-up or accept answer. Unknown problems return null (shown as a plain error).
import { isApiError } from '../../../lib/api-client';

export interface LinkProblem {
  title: string;
  advice: string;
}

const problems: Record<string, LinkProblem> = {
  invalid_token: {
    title: 'This invitation link does not work',
    advice:
      'Check that the whole link was copied from the e-mail. A link stops working when the invitation is sent again; use the newest e-mail.',
  },
  expired: {
    title: 'This invitation has expired',
    advice: 'Ask the project’s owner to send it again; the new e-mail carries a fresh link.',
  },
  already_used: {
    title: 'This invitation has already been accepted',
    advice: 'If you accepted it, sign in to find the project in your list.',
  },
  withdrawn: {
    title: 'This invitation was withdrawn',
    advice: 'The project’s owner withdrew it. Ask them if you still need access.',
  },
};

export function invitationLinkProblem(error: unknown): LinkProblem | null {
  if (!isApiError(error)) return null;
  return problems[error.code] ?? null;
}

/** A link whose token is not even well formed (cut off when copied, say). */
export const malformedLinkProblem: LinkProblem = problems.invalid_token;
