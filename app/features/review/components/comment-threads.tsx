// The review conversation: threads grouped by the revision they speak of, newest revision first,
// replies nested under what they answer; reviewers and up can reply and start new threads.
import { useState } from 'react';
import { Button } from '../../../components/ui/button';
import { ErrorPanel, Loading } from '../../../components/ui/status';
import { formatDateTime } from '../../../utils/format-date';
import { useComments } from '../api/get-comments';
import { groupCommentsByRevision, type CommentThread } from '../utils/group-comments';
import { CommentForm } from './comment-form';

interface CommentThreadsProps {
  figureId: number;
  currentRevision: number;
  canComment: boolean;
}

function ThreadItem({
  figureId,
  thread,
  canComment,
}: {
  figureId: number;
  thread: CommentThread;
  canComment: boolean;
}) {
  const [replying, setReplying] = useState(false);
  const { comment, replies } = thread;
  return (
    <li className="space-y-2">
      <article
        aria-label={`Comment by ${comment.authorName}`}
        className="rounded-lg border border-stone-200 bg-stone-50 px-3 py-2"
      >
        <p className="text-xs text-stone-600">
          <span className="font-semibold text-stone-800">{comment.authorName}</span>{' '}
          <time dateTime={comment.createdAt}>{formatDateTime(comment.createdAt)}</time>
        </p>
        <p className="mt-1 whitespace-pre-line text-sm text-stone-900">{comment.body}</p>
        {canComment && !replying && (
          <Button
            size="sm"
            variant="quiet"
            className="-ml-2 mt-1"
            aria-label={`Reply to ${comment.authorName}`}
            onClick={() => setReplying(true)}
          >
            Reply
          </Button>
        )}
      </article>
      {replying && (
        <div className="ml-6">
          <CommentForm
            figureId={figureId}
            parentId={comment.id}
            label={`Reply to ${comment.authorName}`}
            submitLabel="Post reply"
            onDone={() => setReplying(false)}
          />
        </div>
      )}
      {replies.length > 0 && (
        <ul className="ml-6 space-y-2 border-l-2 border-stone-200 pl-3">
          {replies.map((reply) => (
            <ThreadItem
              key={reply.comment.id}
              figureId={figureId}
              thread={reply}
              canComment={canComment}
            />
          ))}
        </ul>
      )}
    </li>
  );
}

export function CommentThreads({ figureId, currentRevision, canComment }: CommentThreadsProps) {
  const comments = useComments(figureId);

  return (
    <div className="space-y-4">
      {canComment && (
        <CommentForm
          figureId={figureId}
          label={`Comment on revision ${currentRevision}`}
          submitLabel="Post comment"
        />
      )}
      {comments.isPending ? (
        <Loading label="Loading comments…" />
      ) : comments.isError ? (
        <ErrorPanel error={comments.error} onRetry={() => void comments.refetch()} />
      ) : comments.data.length === 0 ? (
        <p className="text-sm text-stone-600">No comments yet.</p>
      ) : (
        groupCommentsByRevision(comments.data).map((group) => (
          <section
            key={group.revision}
            aria-label={`Comments on revision ${group.revision}`}
            className="space-y-2"
          >
            <h4 className="text-sm font-semibold text-stone-700">
              Revision {group.revision}
              {group.revision === currentRevision && ' (current)'}
              <span className="ml-2 font-normal text-stone-500">
                {group.count} {group.count === 1 ? 'comment' : 'comments'}
              </span>
            </h4>
            <ul className="space-y-3">
              {group.threads.map((thread) => (
                <ThreadItem
                  key={thread.comment.id}
                  figureId={figureId}
                  thread={thread}
                  canComment={canComment}
                />
              ))}
            </ul>
          </section>
        ))
      )}
    </div>
  );
}
