// Cells the figure table shows in both its reading and its arranging form: the review status with
// the approved revision, and whether the print files are rendered for the current spec and style.
import type { FigureSummary } from '../../../../shared/api/schemas';
import { cn } from '../../../utils/cn';
import { StatusBadge } from './status-badge';

export function StatusCell({ figure }: { figure: FigureSummary }) {
  return (
    <td className="px-3 py-2">
      <div className="flex flex-wrap items-center gap-x-2 gap-y-1">
        <StatusBadge status={figure.status} />
        {figure.approvedRevision !== null && (
          <span className="whitespace-nowrap text-xs text-stone-600">
            <span aria-hidden="true">approved r{figure.approvedRevision}</span>
            <span className="sr-only">approved at revision {figure.approvedRevision}</span>
          </span>
        )}
      </div>
    </td>
  );
}

export function PrintFilesCell({ figure }: { figure: FigureSummary }) {
  const current = figure.printFilesCurrent;
  return (
    <td className="px-3 py-2">
      <span
        className={cn(
          'inline-flex items-center gap-1.5 whitespace-nowrap text-xs font-semibold',
          current ? 'text-emerald-800' : 'text-amber-900',
        )}
        title={
          current
            ? 'Rendered for the current spec and house style'
            : 'Rendered for an older spec or house style, or not rendered yet'
        }
      >
        <span
          aria-hidden="true"
          className={cn('size-2 rounded-full', current ? 'bg-emerald-600' : 'bg-amber-500')}
        />
        <span className="sr-only">Print files </span>
        {current ? 'current' : 'out of date'}
      </span>
    </td>
  );
}
