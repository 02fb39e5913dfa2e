// After the reader turns or zooms the 3D figure: editors may keep that view as a new revision
// (on top of the revision shown), or go back to the saved one.
import { Button } from '../../../components/ui/button';
import { FormAlert } from '../../../components/ui/status';
import { formErrorMessage } from '../../../lib/form-errors';
import type { Figure } from '../../../../shared/api/schemas';
import type { FigureSpec } from '../../../../shared/spec/figure-spec';
import { useUpdateFigure } from '../api/update-figure';

type View = FigureSpec['view'];

const describeView = (v: View) =>
  `azimuth ${Math.round(v.azimuthDeg)}°, elevation ${Math.round(v.elevationDeg)}°, zoom ${v.zoom}`;

interface SaveViewBarProps {
  figure: Figure;
  view: View;
  canEdit: boolean;
  onSaved: () => void;
  onReset: () => void;
}

export function SaveViewBar({ figure, view, canEdit, onSaved, onReset }: SaveViewBarProps) {
  const update = useUpdateFigure(figure.id, figure.projectId);
  const save = () =>
    update.mutate(
      {
        baseRevision: figure.revision,
        spec: { ...figure.spec, view },
        message: `View: ${describeView(view)}`,
      },
      { onSuccess: onSaved },
    );
  return (
    <div className="space-y-2 rounded-lg border border-accent-200 bg-accent-50 p-3 text-sm">
      <p>
        Shown turned to {describeView(view)}; revision {figure.revision} keeps{' '}
        {describeView(figure.spec.view)}.
      </p>
      <div className="flex flex-wrap gap-2">
        {canEdit && (
          <Button size="sm" variant="primary" busy={update.isPending} onClick={save}>
            {update.isPending ? 'Saving…' : 'Keep this view as a new revision'}
          </Button>
        )}
        <Button size="sm" onClick={onReset} disabled={update.isPending}>
          Back to the saved view
        </Button>
      </div>
      <FormAlert message={formErrorMessage(update.error)} />
    </div>
  );
}
