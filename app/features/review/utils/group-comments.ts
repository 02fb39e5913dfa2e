// Comments as the review panel shows them: grouped by the revision they speak of (newest revision
// first), each group a list of threads in the order they were started, replies nested under the
// comment they answer, oldest first.
import type { Comment } from '../../../../shared/api/schemas';

export interface CommentThread {
  comment: Comment;
  replies: CommentThread[];
}

export interface RevisionComments {
  revision: number;
  threads: CommentThread[];
  /** Comments and replies in this revision. */
  count: number;
}

const byTime = (a: Comment, b: Comment) =>
  Date.parse(a.createdAt) - Date.parse(b.createdAt) || a.id - b.id;

export function groupCommentsByRevision(comments: readonly Comment[]): RevisionComments[] {
  const nodes = new Map<number, CommentThread>();
  for (const comment of [...comments].sort(byTime)) nodes.set(comment.id, { comment, replies: [] });

  const groups = new Map<number, RevisionComments>();
  const groupOf = (revision: number) => {
    let group = groups.get(revision);
    if (!group) groups.set(revision, (group = { revision, threads: [], count: 0 }));
    return group;
  };
  for (const node of nodes.values()) {
    const { parentId, revision } = node.comment;
    const parent = parentId === null ? undefined : nodes.get(parentId);
    // A reply whose parent is missing (not sent, or removed) still shows, as a thread of its own.
    if (parent) parent.replies.push(node);
    else groupOf(revision).threads.push(node);
  }
  for (const node of nodes.values()) {
    // Replies stay in their parent's revision; count them where their thread is shown.
    let root = node;
    while (root.comment.parentId !== null && nodes.has(root.comment.parentId))
      root = nodes.get(root.comment.parentId)!;
    groupOf(root.comment.revision).count += 1;
  }
  return [...groups.values()].sort((a, b) => b.revision - a.revision);
}
