// Which review actions a member may take on a figure now: the same table the server applies
// (api/services/review.ts), so that the page offers only what the server would accept.
import { roleAllows, type ProjectRole } from '../../../../shared/api/roles';
import type { FigureStatus, reviewActions } from '../../../../shared/api/schemas';

export type ReviewAction = (typeof reviewActions)[number];

const transitions: Record<
  ReviewAction,
  { from: readonly FigureStatus[]; needs: 'edit' | 'review' }
> = {
  submit: { from: ['draft', 'changes_requested'], needs: 'edit' },
  request_changes: { from: ['in_review', 'approved'], needs: 'review' },
  approve: { from: ['in_review', 'changes_requested'], needs: 'review' },
};

/** The actions in the order the page shows them; none for an archived project. */
export function availableReviewActions(
  status: FigureStatus,
  role: ProjectRole,
  archived: boolean,
): ReviewAction[] {
  if (archived) return [];
  return (['submit', 'request_changes', 'approve'] as const).filter(
    (a) => transitions[a].from.includes(status) && roleAllows(role, transitions[a].needs),
  );
}
