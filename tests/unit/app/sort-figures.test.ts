// Sorting and filtering a project's figure list as an author expects from a book's figure numbers.
import { describe, expect, it } from 'vitest';
import { filterFigures, sortFigures } from '../../../app/features/figures/utils/sort-figures';
import type { FigureSummary } from '../../../shared/api/schemas';

let nextId = 1;
function figure(number: string, extra: Partial<FigureSummary> = {}): FigureSummary {
  return {
    id: nextId++,
    projectId: 1,
    number,
    title: `Figure ${number}`,
    caption: '',
    altText: '',
    status: 'draft',
    kind: 'isosurface',
    revision: 1,
    approvedRevision: null,
    updatedAt: '2026-01-01T00:00:00.000Z',
    updatedBy: 'Ada Okafor',
    printFilesCurrent: false,
    ...extra,
  };
}

const numbers = (list: FigureSummary[]) => list.map((f) => f.number);

describe('sortFigures', () => {
  const list = [
    figure('4.10'),
    figure(''),
    figure('4.2a'),
    figure('4.9'),
    figure('4.2'),
    figure('10.1'),
  ];

  it('when sorted by number, then numbers compare part by part (4.2 < 4.2a < 4.9 < 4.10 < 10.1; common practice) and unnumbered go last', () => {
    expect(numbers(sortFigures(list, 'number', 'ascending'))).toEqual([
      '4.2',
      '4.2a',
      '4.9',
      '4.10',
      '10.1',
      '',
    ]);
    expect(numbers(sortFigures(list, 'number', 'descending'))).toEqual([
      '10.1',
      '4.10',
      '4.9',
      '4.2a',
      '4.2',
      '',
    ]);
  });

  it('when sorted by status, then figures follow the review order draft, in review, changes requested, approved', () => {
    const byStatus = sortFigures(
      [
        figure('1', { status: 'approved' }),
        figure('2', { status: 'draft' }),
        figure('3', { status: 'changes_requested' }),
        figure('4', { status: 'in_review' }),
      ],
      'status',
      'ascending',
    );
    expect(byStatus.map((f) => f.status)).toEqual([
      'draft',
      'in_review',
      'changes_requested',
      'approved',
    ]);
  });

  it('when sorted by last change, then the newest comes first when descending', () => {
    const sorted = sortFigures(
      [
        figure('1', { updatedAt: '2026-03-01T10:00:00Z' }),
        figure('2', { updatedAt: '2026-03-02T09:00:00Z' }),
        figure('3', { updatedAt: '2026-02-28T23:00:00Z' }),
      ],
      'updated',
      'descending',
    );
    expect(numbers(sorted)).toEqual(['2', '1', '3']);
  });
});

describe('filterFigures', () => {
  const list = [
    figure('4.1', { title: 'The 1s orbital', status: 'approved' }),
    figure('4.2', { title: 'Radial distributions', caption: 'r²R² for 1s, 2s and 3s' }),
    figure('4.3', { title: 'The 2p_z orbital', status: 'in_review' }),
  ];

  it('when filtering by text, then number, title and caption are searched without regard to case', () => {
    expect(numbers(filterFigures(list, { text: '2S', status: 'all' }))).toEqual(['4.2']);
    expect(numbers(filterFigures(list, { text: 'orbital', status: 'all' }))).toEqual([
      '4.1',
      '4.3',
    ]);
    expect(numbers(filterFigures(list, { text: '4.3', status: 'all' }))).toEqual(['4.3']);
  });

  it('when filtering by status, then only that status remains, combined with the text', () => {
    expect(numbers(filterFigures(list, { text: '', status: 'approved' }))).toEqual(['4.1']);
    expect(numbers(filterFigures(list, { text: 'orbital', status: 'in_review' }))).toEqual(['4.3']);
    expect(filterFigures(list, { text: 'nothing like this', status: 'all' })).toEqual([]);
  });
});
