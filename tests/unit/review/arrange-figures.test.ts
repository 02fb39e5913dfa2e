// Arranging a project's figure list before saving it as one order: moves, sequential numbering under
// a chapter prefix (the "4.1, 4.2, …" scheme of textbook figures, common practice), repeated numbers.
import { describe, expect, it } from 'vitest';
import {
  arrangementChanged,
  duplicateNumbers,
  moveItem,
  renumberSequentially,
  sequentialNumbers,
} from '../../../app/features/figures/utils/arrange-figures';

const list = (...numbers: string[]) => numbers.map((number, i) => ({ id: i + 1, number }));

describe('moveItem', () => {
  it('when an item moves up one place, then it swaps with the one above', () => {
    expect(moveItem(['a', 'b', 'c', 'd'], 2, 1)).toEqual(['a', 'c', 'b', 'd']);
  });
  it('when an item moves to the end, then the others close up', () => {
    expect(moveItem(['a', 'b', 'c', 'd'], 0, 3)).toEqual(['b', 'c', 'd', 'a']);
  });
  it('when a move leaves the list, then nothing changes and the input is not touched', () => {
    const items = ['a', 'b'];
    expect(moveItem(items, 0, -1)).toEqual(['a', 'b']);
    expect(moveItem(items, 1, 2)).toEqual(['a', 'b']);
    expect(moveItem(items, 1, 0)).toEqual(['b', 'a']);
    expect(items).toEqual(['a', 'b']);
  });
});

describe('sequentialNumbers', () => {
  it('when the prefix is a chapter, then numbers run 4.1, 4.2, … past 4.9 to 4.10', () => {
    expect(sequentialNumbers(10, '4')).toEqual([
      '4.1', '4.2', '4.3', '4.4', '4.5', '4.6', '4.7', '4.8', '4.9', '4.10',
    ]);
  });
  it('when the prefix ends in a dot or has spaces, then the dot is not doubled', () => {
    expect(sequentialNumbers(2, ' L3. ')).toEqual(['L3.1', 'L3.2']);
  });
  it('when the prefix is empty, then numbers are plain counts', () => {
    expect(sequentialNumbers(3, '')).toEqual(['1', '2', '3']);
  });
  it('when the prefix holds a character figure numbers may not use, then the error names the prefix', () => {
    expect(() => sequentialNumbers(2, '4/')).toThrow(/^prefix: “4\/” would give “4\/\.1”/);
  });
});

describe('renumberSequentially', () => {
  it('when a list in a new order is renumbered, then each figure takes the number of its place', () => {
    const arranged = [
      { id: 7, number: '4.2' },
      { id: 3, number: '4.1' },
      { id: 9, number: '' },
    ];
    expect(renumberSequentially(arranged, '4')).toEqual([
      { id: 7, number: '4.1' },
      { id: 3, number: '4.2' },
      { id: 9, number: '4.3' },
    ]);
  });
});

describe('duplicateNumbers', () => {
  it('when two figures share a number, then that number is reported once; blanks may repeat', () => {
    expect([...duplicateNumbers(list('4.1', '4.2', '4.1 ', '', '', '4.2a'))]).toEqual(['4.1']);
  });
});

describe('arrangementChanged', () => {
  const saved = list('4.1', '4.2', '4.3');
  it('when nothing moved or changed, then it is unchanged (trailing spaces do not count)', () => {
    expect(arrangementChanged(saved, list('4.1', '4.2 ', '4.3'))).toBe(false);
  });
  it('when two figures swapped places, then it changed', () => {
    expect(arrangementChanged(saved, moveItem(saved, 0, 1))).toBe(true);
  });
  it('when a number was edited, then it changed', () => {
    expect(arrangementChanged(saved, list('4.1', '4.2a', '4.3'))).toBe(true);
  });
});
