// Review comments grouped by the revision they speak of, newest revision first, replies nested under
// what they answer (the server keeps a reply in its parent's revision; api/services/review.ts).
import { describe, expect, it } from 'vitest';
import type { Comment } from '../../../shared/api/schemas';
import {
  groupCommentsByRevision,
  type CommentThread,
} from '../../../app/features/review/utils/group-comments';

function comment(id: number, revision: number, parentId: number | null, minute: number): Comment {
  return {
    id,
    figureId: 1,
    revision,
    parentId,
    authorName: 'Lena Brandt',
    body: `comment ${id}`,
    createdAt: `2026-12-02T09:${String(minute).padStart(2, '0')}:00.000Z`,
  };
}

const shape = (threads: CommentThread[]): unknown[] =>
  threads.map((t) => (t.replies.length ? [t.comment.id, shape(t.replies)] : t.comment.id));

describe('groupCommentsByRevision', () => {
  it('when there are no comments, then there are no groups', () => {
    expect(groupCommentsByRevision([])).toEqual([]);
  });

  it('when comments speak of three revisions, then the newest revision comes first', () => {
    const groups = groupCommentsByRevision([
      comment(1, 1, null, 0),
      comment(2, 3, null, 5),
      comment(3, 2, null, 3),
    ]);
    expect(groups.map((g) => g.revision)).toEqual([3, 2, 1]);
  });

  it('when replies arrive after a newer revision, then they stay in their thread of the old revision', () => {
    const groups = groupCommentsByRevision([
      comment(1, 1, null, 0),
      comment(2, 2, null, 10),
      comment(3, 1, 1, 12), // a reply, written while revision 2 was current
      comment(4, 1, 3, 13), // a reply to the reply
      comment(5, 1, null, 1),
    ]);
    expect(groups.map((g) => [g.revision, shape(g.threads), g.count])).toEqual([
      [2, [2], 1],
      [1, [[1, [[3, [4]]]], 5], 4],
    ]);
  });

  it('when comments arrive out of order, then threads and replies run oldest first', () => {
    const [group] = groupCommentsByRevision([
      comment(4, 1, 1, 30),
      comment(2, 1, null, 20),
      comment(3, 1, 1, 25),
      comment(1, 1, null, 10),
    ]);
    expect(shape(group.threads)).toEqual([[1, [3, 4]], 2]);
  });

  it('when a reply’s parent is not in the list, then the reply shows as a thread of its own', () => {
    const [group] = groupCommentsByRevision([comment(7, 2, 99, 0)]);
    expect(group).toMatchObject({ revision: 2, count: 1 });
    expect(shape(group.threads)).toEqual([7]);
  });
});
