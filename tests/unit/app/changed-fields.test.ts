// The revision list's "what changed" wording from the server's dotted paths.
import { describe, expect, it } from 'vitest';
import {
  changedFieldNames,
  describeChanges,
} from '../../../app/features/figures/utils/changed-fields';

describe('changedFieldNames', () => {
  it('when paths are in the spec, then the "spec." prefix is dropped', () => {
    expect(changedFieldNames(['title', 'spec.kind.enclosed'])).toEqual(['title', 'kind.enclosed']);
  });

  it('when a name is written in camel case, then it reads as words', () => {
    expect(changedFieldNames(['altText', 'spec.kind.outerSurface'])).toEqual([
      'alt text',
      'kind.outer surface',
    ]);
  });

  it('when several parts of one orbital term change, then they read as one change of the list', () => {
    expect(
      changedFieldNames([
        'spec.state.terms.0.weight.im',
        'spec.state.terms.0.weight.re',
        'spec.state.terms.1.n',
      ]),
    ).toEqual(['state.terms']);
  });

  it('when a path is deeper than two levels, then it is cut after the second', () => {
    expect(changedFieldNames(['spec.kind.outerSurface.opacity'])).toEqual(['kind.outer surface']);
  });

  it('when the whole value was replaced, then it says so', () => {
    expect(changedFieldNames(['(value)'])).toEqual(['everything']);
  });
});

describe('describeChanges', () => {
  it('when fields changed, then they are listed after "changed:"', () => {
    expect(describeChanges(['title', 'spec.kind.enclosed'], false)).toBe(
      'changed: title, kind.enclosed',
    );
  });

  it('when nothing is listed for the first revision, then it is called the first revision', () => {
    expect(describeChanges([], true)).toBe('first revision');
  });

  it('when nothing is listed for a later revision, then it says no changes', () => {
    expect(describeChanges([], false)).toBe('no changes');
  });

  it('when more than six fields changed, then the rest are counted', () => {
    const paths = ['title', 'caption', 'altText', 'number', 'spec.kind.grid', 'spec.view.zoom', 'spec.look.theme', 'spec.print.dpi'];
    expect(describeChanges(paths, false)).toBe(
      'changed: title, caption, alt text, number, kind.grid, view.zoom and 2 more',
    );
  });
});
