// Review statuses of a figure in words, in the order a figure usually passes through them.
import type { FigureStatus } from '../../../../shared/api/schemas';

export const statusNames: Record<FigureStatus, string> = {
  draft: 'Draft',
  in_review: 'In review',
  changes_requested: 'Changes requested',
  approved: 'Approved',
};

export const statusOrder: Record<FigureStatus, number> = {
  draft: 0,
  in_review: 1,
  changes_requested: 2,
  approved: 3,
};
