// Says why a mailed link cannot be used and what to do instead.
import type { ReactNode } from 'react';
import type { AccountLinkProblem } from '../utils/account-link-problem';

export function LinkProblemNotice({
  problem,
  action,
}: {
  problem: AccountLinkProblem;
  action?: ReactNode;
}) {
  return (
    <div role="alert" className="space-y-3 text-sm">
      <p className="font-semibold text-red-900">{problem.title}</p>
      <p className="text-stone-800">{problem.advice}</p>
      {action}
    </div>
  );
}
