// A project's figures as a table that sorts by number, title, status or last change, and
// filters by text and status. Each title links to the figure's page.
import { useId, useState } from 'react';
import { Link } from 'react-router';
import { SelectField, TextField } from '../../../components/ui/form-field';
import {
  figureStatuses,
  type FigureStatus,
  type FigureSummary,
} from '../../../../shared/api/schemas';
import { cn } from '../../../utils/cn';
import { formatDateTime } from '../../../utils/format-date';
import { kindName } from '../utils/figure-kinds';
import { statusNames } from '../utils/figure-statuses';
import {
  filterFigures,
  sortFigures,
  type FigureSortKey,
  type SortDirection,
} from '../utils/sort-figures';
import { StatusBadge } from './status-badge';

interface SortableHeaderProps {
  label: string;
  sortKey: FigureSortKey;
  sort: { key: FigureSortKey; direction: SortDirection };
  onSort: (key: FigureSortKey) => void;
  className?: string;
}

function SortableHeader({ label, sortKey, sort, onSort, className }: SortableHeaderProps) {
  const active = sort.key === sortKey;
  return (
    <th
      scope="col"
      aria-sort={active ? sort.direction : 'none'}
      className={cn('px-3 py-2 text-left', className)}
    >
      <button
        type="button"
        onClick={() => onSort(sortKey)}
        className="inline-flex items-center gap-1 rounded font-semibold hover:text-accent-700"
      >
        {label}
        <span
          aria-hidden="true"
          className={cn('text-xs', active ? 'text-accent-700' : 'text-stone-400')}
        >
          {active ? (sort.direction === 'ascending' ? '▲' : '▼') : '↕'}
        </span>
      </button>
    </th>
  );
}

export function FigureTable({ figures }: { figures: FigureSummary[] }) {
  const [text, setText] = useState('');
  const [status, setStatus] = useState<FigureStatus | 'all'>('all');
  const [sort, setSort] = useState<{ key: FigureSortKey; direction: SortDirection }>({
    key: 'number',
    direction: 'ascending',
  });
  const countId = useId();

  const onSort = (key: FigureSortKey) =>
    setSort((s) => ({
      key,
      direction: s.key === key && s.direction === 'ascending' ? 'descending' : 'ascending',
    }));

  const shown = sortFigures(filterFigures(figures, { text, status }), sort.key, sort.direction);
  const filtering = text.trim() !== '' || status !== 'all';

  return (
    <div className="space-y-4">
      <div role="search" aria-label="Filter figures" className="flex flex-wrap items-end gap-4">
        <TextField
          label="Filter by text"
          type="search"
          value={text}
          onChange={(e) => setText(e.target.value)}
          placeholder="Number, title or caption"
          className="w-72"
          aria-controls={countId}
        />
        <SelectField
          label="Status"
          value={status}
          onChange={(e) => setStatus(e.target.value as FigureStatus | 'all')}
          className="w-52"
          aria-controls={countId}
        >
          <option value="all">All statuses</option>
          {figureStatuses.map((s) => (
            <option key={s} value={s}>
              {statusNames[s]}
            </option>
          ))}
        </SelectField>
        <p id={countId} role="status" className="pb-2 text-sm text-stone-600">
          {filtering
            ? `${shown.length} of ${figures.length} figures shown`
            : `${figures.length} ${figures.length === 1 ? 'figure' : 'figures'}`}
        </p>
      </div>

      <div className="overflow-x-auto rounded-xl border border-stone-200 bg-white">
        <table className="w-full min-w-[46rem] border-collapse text-sm">
          <caption className="sr-only">
            Figures in this project; column headers sort the table
          </caption>
          <thead className="border-b border-stone-200 bg-stone-50 text-stone-700">
            <tr>
              <SortableHeader
                label="Number"
                sortKey="number"
                sort={sort}
                onSort={onSort}
                className="w-28"
              />
              <SortableHeader label="Title" sortKey="title" sort={sort} onSort={onSort} />
              <th scope="col" className="px-3 py-2 text-left font-semibold">
                Kind
              </th>
              <SortableHeader label="Status" sortKey="status" sort={sort} onSort={onSort} />
              <th scope="col" className="px-3 py-2 text-right font-semibold">
                Revision
              </th>
              <SortableHeader label="Updated" sortKey="updated" sort={sort} onSort={onSort} />
            </tr>
          </thead>
          <tbody>
            {shown.map((figure) => (
              <tr
                key={figure.id}
                className="border-b border-stone-100 last:border-0 hover:bg-stone-50"
              >
                <td className="px-3 py-2 tabular-nums text-stone-700">
                  {figure.number || <span className="text-stone-500">—</span>}
                </td>
                <th scope="row" className="px-3 py-2 text-left font-normal">
                  <Link
                    to={`/figures/${figure.id}`}
                    className="font-semibold text-accent-700 underline-offset-2 hover:underline"
                  >
                    {figure.title}
                  </Link>
                </th>
                <td className="px-3 py-2 text-stone-700">{kindName(figure.kind)}</td>
                <td className="px-3 py-2">
                  <StatusBadge status={figure.status} />
                </td>
                <td className="px-3 py-2 text-right tabular-nums text-stone-700">
                  {figure.revision}
                </td>
                <td className="px-3 py-2 text-stone-700">
                  {formatDateTime(figure.updatedAt)}
                  <span className="block text-xs text-stone-600">by {figure.updatedBy}</span>
                </td>
              </tr>
            ))}
            {shown.length === 0 && (
              <tr>
                <td colSpan={6} className="px-3 py-8 text-center text-stone-600">
                  {figures.length === 0 ? 'No figures yet.' : 'No figures match the filter.'}
                </td>
              </tr>
            )}
          </tbody>
        </table>
      </div>
    </div>
  );
}
