// The review of one figure, for the figure page: its status and approved revision, the status
// changes the member's role and the status allow, the comment threads by revision, and the status
// history. It takes only the figure's id so that the page places it with one element; it reads the
// figure and the member's role from the figures and projects features' own queries (the same cache
// the page uses) and writes a changed figure back there, which makes it the one place where the
// review feature meets those two.
import { useQuery, useQueryClient } from '@tanstack/react-query';
import { roleAllows } from '../../../../shared/api/roles';
import type { Figure } from '../../../../shared/api/schemas';
import { Panel } from '../../../components/ui/panel';
import { ErrorPanel, Loading } from '../../../components/ui/status';
import { getFigureQueryOptions, useFigure } from '../../figures/api/get-figure';
import { getFiguresQueryOptions } from '../../figures/api/get-figures';
import { StatusBadge } from '../../figures/components/status-badge';
import { statusNames } from '../../figures/utils/figure-statuses';
import { getProjectQueryOptions } from '../../projects/api/get-project';
import { useApplyReviewAction } from '../api/apply-review-action';
import { availableReviewActions } from '../utils/review-actions';
import { CommentThreads } from './comment-threads';
import { ReviewActions } from './review-actions';
import { ReviewHistory } from './review-history';

export function ReviewPanel({ figureId }: { figureId: number }) {
  const figure = useFigure(figureId);
  const projectId = figure.data?.projectId;
  const project = useQuery({
    ...getProjectQueryOptions(projectId ?? 0),
    enabled: projectId !== undefined,
  });
  const queryClient = useQueryClient();
  const onFigure = (changed: Figure | null) => {
    const { queryKey } = getFigureQueryOptions(figureId);
    if (changed) queryClient.setQueryData(queryKey, changed);
    else void queryClient.invalidateQueries({ queryKey });
    if (projectId !== undefined)
      void queryClient.invalidateQueries({
        queryKey: getFiguresQueryOptions(projectId).queryKey,
      });
  };
  const review = useApplyReviewAction(figureId, onFigure);

  let body;
  if (figure.isError)
    body = <ErrorPanel error={figure.error} onRetry={() => void figure.refetch()} />;
  else if (project.isError)
    body = <ErrorPanel error={project.error} onRetry={() => void project.refetch()} />;
  else if (figure.isPending || project.isPending) body = <Loading label="Loading the review…" />;
  else {
    const f = figure.data;
    const { role, archived } = project.data;
    const actions = availableReviewActions(f.status, role, archived);
    const canComment = roleAllows(role, 'review') && !archived;
    body = (
      <div className="space-y-6">
        <div className="space-y-3">
          <p className="flex flex-wrap items-center gap-2 text-sm text-stone-700">
            <StatusBadge status={f.status} />
            <span>Revision {f.revision}</span>
            {f.approvedRevision !== null && (
              <span className="font-semibold text-emerald-900">
                Approved revision: {f.approvedRevision}
                {f.approvedRevision !== f.revision && ' (an older one)'}
              </span>
            )}
          </p>
          <ReviewActions actions={actions} revision={f.revision} mutation={review} />
        </div>
        <section aria-labelledby="review-comments-title" className="space-y-3">
          <h3 id="review-comments-title" className="font-semibold">
            Comments
          </h3>
          <CommentThreads figureId={figureId} currentRevision={f.revision} canComment={canComment} />
        </section>
        <section aria-labelledby="review-history-title" className="space-y-3">
          <h3 id="review-history-title" className="font-semibold">
            Status history
          </h3>
          <ReviewHistory figureId={figureId} statusNames={statusNames} />
        </section>
      </div>
    );
  }

  return (
    <Panel id="review-title" title="Review">
      {body}
    </Panel>
  );
}
