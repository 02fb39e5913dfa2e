// A project's figures as a table in the project's list order, that also sorts by number, title,
// status or last change, and filters by text and status. Each title links to the figure's page.
// Rows can be ticked for bulk actions; editors switch the table to arranging the list order and
// numbers (figure-table-arrange.tsx).
import { useEffect, useId, useRef, useState } from 'react';
import { Link } from 'react-router';
import { Button } from '../../../components/ui/button';
import { SelectField, TextField } from '../../../components/ui/form-field';
import { SavedNote } from '../../../components/ui/status';
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
import { figureLabel } from '../utils/figure-label';
import { FigureTableArrange } from './figure-table-arrange';
import { FigureTableBulkActions } from './figure-table-bulk-actions';
import { PrintFilesCell, StatusCell } from './figure-table-cells';

/** 'order' is the project's own list order, as the server gives it. */
type TableSortKey = FigureSortKey | 'order';
type TableSort = { key: TableSortKey; direction: SortDirection };

function sortForTable(figures: FigureSummary[], sort: TableSort): FigureSummary[] {
  if (sort.key !== 'order') return sortFigures(figures, sort.key, sort.direction);
  return sort.direction === 'ascending' ? figures : [...figures].reverse();
}

interface SortableHeaderProps {
  label: string;
  sortKey: TableSortKey;
  sort: TableSort;
  onSort: (key: TableSortKey) => void;
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

interface FigureTableProps {
  projectId: number;
  /** In the project's list order. */
  figures: FigureSummary[];
  /** Editors may arrange, submit and delete. */
  canEdit?: boolean;
  onExportSelected?: (ids: number[]) => void;
  onDeleted?: (ids: number[]) => void;
}

export function FigureTable({
  projectId,
  figures,
  canEdit = false,
  onExportSelected,
  onDeleted,
}: FigureTableProps) {
  const [text, setText] = useState('');
  const [status, setStatus] = useState<FigureStatus | 'all'>('all');
  const [sort, setSort] = useState<TableSort>({ key: 'order', direction: 'ascending' });
  const [ticked, setTicked] = useState<ReadonlySet<number>>(new Set());
  const [arranging, setArranging] = useState(false);
  const [orderSaved, setOrderSaved] = useState(false);
  const countId = useId();
  const allBox = useRef<HTMLInputElement>(null);

  const onSort = (key: TableSortKey) =>
    setSort((s) => ({
      key,
      direction: s.key === key && s.direction === 'ascending' ? 'descending' : 'ascending',
    }));

  const positions = new Map(figures.map((f, i) => [f.id, i + 1]));
  const shown = sortForTable(filterFigures(figures, { text, status }), sort);
  const filtering = text.trim() !== '' || status !== 'all';
  // Figures deleted meanwhile drop out of the selection by themselves.
  const selected = figures.filter((f) => ticked.has(f.id));
  const shownTicked = shown.filter((f) => ticked.has(f.id)).length;
  const allShownTicked = shown.length > 0 && shownTicked === shown.length;

  useEffect(() => {
    if (allBox.current) allBox.current.indeterminate = shownTicked > 0 && !allShownTicked;
  }, [shownTicked, allShownTicked]);

  function tick(id: number, on: boolean) {
    setTicked((old) => {
      const next = new Set(old);
      if (on) next.add(id);
      else next.delete(id);
      return next;
    });
  }

  function tickAllShown(on: boolean) {
    setTicked((old) => {
      const next = new Set(old);
      for (const f of shown) {
        if (on) next.add(f.id);
        else next.delete(f.id);
      }
      return next;
    });
  }

  if (arranging)
    return (
      <FigureTableArrange
        projectId={projectId}
        figures={figures}
        onDone={(saved) => {
          setArranging(false);
          setOrderSaved(saved);
          if (saved) setSort({ key: 'order', direction: 'ascending' });
        }}
      />
    );

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
        {canEdit && figures.length > 0 && (
          <Button
            className="mb-1 ml-auto"
            onClick={() => {
              setOrderSaved(false);
              setArranging(true);
            }}
          >
            Reorder and renumber
          </Button>
        )}
      </div>
      {orderSaved && <SavedNote>Order and numbers saved.</SavedNote>}
      {figures.length > 0 && (canEdit || onExportSelected) && (
        <FigureTableBulkActions
          projectId={projectId}
          selected={selected}
          canEdit={canEdit}
          onExport={onExportSelected}
          onClear={() => setTicked(new Set())}
          onDeleted={(ids) => {
            setTicked((old) => new Set([...old].filter((id) => !ids.includes(id))));
            onDeleted?.(ids);
          }}
        />
      )}

      <div className="overflow-x-auto rounded-xl border border-stone-200 bg-white">
        <table className="w-full min-w-[58rem] border-collapse text-sm">
          <caption className="sr-only">
            Figures in this project; column headers sort the table
          </caption>
          <thead className="border-b border-stone-200 bg-stone-50 text-stone-700">
            <tr>
              <th scope="col" className="w-10 px-3 py-2 text-left">
                <input
                  ref={allBox}
                  type="checkbox"
                  aria-label="Select all shown figures"
                  checked={allShownTicked}
                  disabled={shown.length === 0}
                  onChange={(e) => tickAllShown(e.target.checked)}
                  className="size-4 accent-accent-600"
                />
              </th>
              <SortableHeader
                label="Order"
                sortKey="order"
                sort={sort}
                onSort={onSort}
                className="w-20"
              />
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
              <th scope="col" className="px-3 py-2 text-left font-semibold">
                Print files
              </th>
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
                className={cn(
                  'border-b border-stone-100 last:border-0 hover:bg-stone-50',
                  ticked.has(figure.id) && 'bg-accent-50 hover:bg-accent-50',
                )}
              >
                <td className="px-3 py-2">
                  <input
                    type="checkbox"
                    aria-label={`Select ${figureLabel(figure)}: ${figure.title}`}
                    checked={ticked.has(figure.id)}
                    onChange={(e) => tick(figure.id, e.target.checked)}
                    className="size-4 accent-accent-600"
                  />
                </td>
                <td className="px-3 py-2 tabular-nums text-stone-500">
                  {positions.get(figure.id)}
                </td>
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
                <StatusCell figure={figure} />
                <PrintFilesCell figure={figure} />
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
                <td colSpan={9} className="px-3 py-8 text-center text-stone-600">
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
