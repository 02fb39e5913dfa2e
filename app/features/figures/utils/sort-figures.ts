// Sorting and filtering of a project's figure list.
import type { FigureStatus, FigureSummary } from '../../../../shared/api/schemas';
import { statusOrder } from './figure-statuses';

export type FigureSortKey = 'number' | 'title' | 'status' | 'updated';
export type SortDirection = 'ascending' | 'descending';

// Numeric collation so that 4.10 comes after 4.9, and 4.2a after 4.2.
const collator = new Intl.Collator('en-GB', { numeric: true, sensitivity: 'base' });

const compare: Record<FigureSortKey, (a: FigureSummary, b: FigureSummary) => number> = {
  // Unnumbered figures go last, whichever way the numbers run.
  number: (a, b) => collator.compare(a.number, b.number),
  title: (a, b) => collator.compare(a.title, b.title),
  status: (a, b) => statusOrder[a.status] - statusOrder[b.status],
  updated: (a, b) => Date.parse(a.updatedAt) - Date.parse(b.updatedAt),
};

export function sortFigures(
  figures: FigureSummary[],
  key: FigureSortKey,
  direction: SortDirection,
): FigureSummary[] {
  const sign = direction === 'ascending' ? 1 : -1;
  return [...figures].sort((a, b) => {
    if (key === 'number' && (a.number === '') !== (b.number === ''))
      return a.number === '' ? 1 : -1;
    return sign * compare[key](a, b) || collator.compare(a.number, b.number) || a.id - b.id;
  });
}

export interface FigureFilter {
  text: string;
  status: FigureStatus | 'all';
}

export function filterFigures(
  figures: FigureSummary[],
  { text, status }: FigureFilter,
): FigureSummary[] {
  const needle = text.trim().toLocaleLowerCase('en-GB');
  return figures.filter(
    (f) =>
      (status === 'all' || f.status === status) &&
      (needle === '' ||
        [f.number, f.title, f.caption].some((s) => s.toLocaleLowerCase('en-GB').includes(needle))),
  );
}
