// A figure's review status as a tag; colour only repeats what the words say.
import type { FigureStatus } from '../../../../shared/api/schemas';
import { cn } from '../../../utils/cn';
import { statusNames } from '../utils/figure-statuses';

const tones: Record<FigureStatus, string> = {
  draft: 'bg-stone-100 text-stone-800 ring-stone-300',
  in_review: 'bg-accent-50 text-accent-800 ring-accent-200',
  changes_requested: 'bg-amber-50 text-amber-900 ring-amber-300',
  approved: 'bg-emerald-50 text-emerald-900 ring-emerald-300',
};

export function StatusBadge({ status }: { status: FigureStatus }) {
  return (
    <span
      className={cn(
        'inline-flex items-center whitespace-nowrap rounded-full px-2 py-0.5 text-xs font-semibold ring-1 ring-inset',
        tones[status],
      )}
    >
      {statusNames[status]}
    </span>
  );
}
