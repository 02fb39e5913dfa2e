// Why a password-reset or e-mail-confirmation link cannot be used, in words, from the server's
// answer: a bad or used token is a 400 naming the `token` field, an old one is 410 expired.
import { ApiError } from '../../../lib/api-client';

export type AccountLink = 'reset' | 'confirm-email';

export interface AccountLinkProblem {
  title: string;
  advice: string;
}

const ask: Record<AccountLink, string> = {
  reset: 'Ask for a new reset link.',
  'confirm-email': 'Ask for the change again on your account page; a new link will be sent.',
};

export function accountLinkProblem(error: unknown, link: AccountLink): AccountLinkProblem | null {
  if (!(error instanceof ApiError)) return null;
  if (error.status === 410 || error.code === 'expired')
    return { title: 'This link has expired', advice: ask[link] };
  if ('token' in error.fields || error.code === 'invalid_token')
    return { title: 'This link does not work', advice: `It may have been used already. ${ask[link]}` };
  return null;
}

/** For a link whose token is not even well formed (cut off when copied, say). */
export function malformedAccountLink(link: AccountLink): AccountLinkProblem {
  return {
    title: 'This link does not work',
    advice: `Check that the whole link was copied from the e-mail. ${ask[link]}`,
  };
}
