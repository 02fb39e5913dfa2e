// The figure's status changes, newest first: when, who, from → to, at which revision, and the note.
import type { FigureStatus } from '../../../../shared/api/schemas';
import { ErrorPanel, Loading } from '../../../components/ui/status';
import { formatDateTime } from '../../../utils/format-date';
import { useReviewEvents } from '../api/get-review-events';

const HISTORY_COLUMNS = [
  ['When', ''],
  ['Who', ''],
  ['Change', ''],
  ['Revision', 'text-right'],
  ['Note', ''],
] as const;

interface ReviewHistoryProps {
  figureId: number;
  statusNames: Record<FigureStatus, string>;
}

export function ReviewHistory({ figureId, statusNames }: ReviewHistoryProps) {
  const events = useReviewEvents(figureId);
  if (events.isPending) return <Loading label="Loading the status history…" />;
  if (events.isError)
    return <ErrorPanel error={events.error} onRetry={() => void events.refetch()} />;
  if (events.data.length === 0)
    return <p className="text-sm text-stone-600">The status has not changed yet.</p>;

  return (
    <div className="overflow-x-auto">
      <table className="w-full border-collapse text-sm">
        <caption className="sr-only">Status history, newest first</caption>
        <thead className="border-b border-stone-200 text-left text-stone-700">
          <tr>
            {HISTORY_COLUMNS.map(([label, align]) => (
              <th key={label} scope="col" className={`py-1.5 pr-3 font-semibold ${align}`}>
                {label}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {[...events.data].reverse().map((e) => (
            <tr key={e.id} className="border-b border-stone-100 align-top last:border-0">
              <td className="py-1.5 pr-3 whitespace-nowrap text-stone-700">
                <time dateTime={e.createdAt}>{formatDateTime(e.createdAt)}</time>
              </td>
              <th scope="row" className="py-1.5 pr-3 text-left font-normal">
                {e.actorName}
              </th>
              <td className="py-1.5 pr-3">
                {statusNames[e.fromStatus]} <span aria-hidden="true">→</span>
                <span className="sr-only"> to</span> {statusNames[e.toStatus]}
              </td>
              <td className="py-1.5 pr-3 text-right tabular-nums">{e.revision}</td>
              <td className="py-1.5 whitespace-pre-line text-stone-700">{e.note || '—'}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
