// Duplicate and delete, for editors; deleting asks first and says what will be lost.
import { useState } from 'react';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { FormAlert } from '../../../components/ui/status';
import { formErrorMessage } from '../../../lib/form-errors';
import type { Figure } from '../../../../shared/api/schemas';
import { useDeleteFigure } from '../api/delete-figure';
import { useDuplicateFigure } from '../api/duplicate-figure';

interface FigureActionsProps {
  figure: Figure;
  onDuplicated: (copy: Figure) => void;
  onDeleted: () => void;
}

export function FigureActions({ figure, onDuplicated, onDeleted }: FigureActionsProps) {
  const duplicate = useDuplicateFigure(figure.projectId);
  const remove = useDeleteFigure(figure.projectId);
  const [confirming, setConfirming] = useState(false);
  const label = figure.number ? `figure ${figure.number}` : `“${figure.title}”`;

  return (
    <div className="flex flex-col items-end gap-2">
      <div className="flex gap-2">
        <Button
          busy={duplicate.isPending}
          onClick={() => duplicate.mutate(figure.id, { onSuccess: onDuplicated })}
        >
          {duplicate.isPending ? 'Duplicating…' : 'Duplicate'}
        </Button>
        <Button variant="danger" onClick={() => setConfirming(true)}>
          Delete…
        </Button>
      </div>
      <FormAlert message={formErrorMessage(duplicate.error)} />
      <Dialog
        open={confirming}
        onClose={() => setConfirming(false)}
        title={`Delete ${label}?`}
        description={`This removes the figure and ${figure.revision === 1 ? 'its one revision' : `all ${figure.revision} of its revisions`} from the project. It cannot be undone.`}
      >
        <FormAlert message={formErrorMessage(remove.error)} />
        <div className="flex justify-end gap-2">
          <Button onClick={() => setConfirming(false)}>Keep it</Button>
          <Button
            variant="danger"
            busy={remove.isPending}
            onClick={() => remove.mutate(figure.id, { onSuccess: onDeleted })}
          >
            {remove.isPending ? 'Deleting…' : 'Delete figure'}
          </Button>
        </div>
      </Dialog>
    </div>
  );
}
