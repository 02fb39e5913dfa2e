// The review actions the figure page offers, by status and role: the transitions of issue 6 as the
// server applies them (api/services/review.ts): editors submit drafts and figures sent back;
// reviewers and up request changes or approve.
import { describe, expect, it } from 'vitest';
import { availableReviewActions } from '../../../app/features/review/utils/review-actions';

describe('availableReviewActions', () => {
  it('when a figure is a draft, then only editors and owners may submit it', () => {
    expect(availableReviewActions('draft', 'owner', false)).toEqual(['submit']);
    expect(availableReviewActions('draft', 'editor', false)).toEqual(['submit']);
    expect(availableReviewActions('draft', 'reviewer', false)).toEqual([]);
    expect(availableReviewActions('draft', 'viewer', false)).toEqual([]);
  });

  it('when a figure is in review, then a reviewer may request changes or approve', () => {
    expect(availableReviewActions('in_review', 'reviewer', false)).toEqual([
      'request_changes',
      'approve',
    ]);
    expect(availableReviewActions('in_review', 'viewer', false)).toEqual([]);
  });

  it('when changes were requested, then an editor may resubmit and a reviewer may still approve', () => {
    expect(availableReviewActions('changes_requested', 'editor', false)).toEqual([
      'submit',
      'approve',
    ]);
    expect(availableReviewActions('changes_requested', 'reviewer', false)).toEqual(['approve']);
  });

  it('when a figure is approved, then it can only be sent back', () => {
    expect(availableReviewActions('approved', 'owner', false)).toEqual(['request_changes']);
  });

  it('when the project is archived, then nothing is offered', () => {
    expect(availableReviewActions('in_review', 'owner', true)).toEqual([]);
  });
});
