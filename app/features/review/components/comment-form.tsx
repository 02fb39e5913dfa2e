// Writes a comment on the figure's current revision, or a reply in a thread.
import { useState, type FormEvent } from 'react';
import { Button } from '../../../components/ui/button';
import { TextAreaField } from '../../../components/ui/form-field';
import { FormAlert } from '../../../components/ui/status';
import { useValidatedSubmit } from '../../../hooks/use-validated-submit';
import { formErrorMessage } from '../../../lib/form-errors';
import { createCommentBody } from '../../../../shared/api/schemas';
import { useCreateComment } from '../api/create-comment';

interface CommentFormProps {
  figureId: number;
  /** Set for a reply. */
  parentId?: number;
  label: string;
  submitLabel: string;
  onDone?: () => void;
}

export function CommentForm({ figureId, parentId, label, submitLabel, onDone }: CommentFormProps) {
  const create = useCreateComment(figureId);
  const { errors, submit } = useValidatedSubmit(createCommentBody, create);
  const [body, setBody] = useState('');

  function onSubmit(event: FormEvent) {
    event.preventDefault();
    submit({ body, parentId }, () => {
      setBody('');
      onDone?.();
    });
  }

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-2">
      <FormAlert message={formErrorMessage(create.error, ['body'])} />
      <TextAreaField
        label={label}
        value={body}
        onChange={(e) => setBody(e.target.value)}
        error={errors.body}
        rows={parentId ? 2 : 3}
      />
      <div className="flex gap-2">
        <Button type="submit" size="sm" variant="primary" busy={create.isPending}>
          {create.isPending ? 'Posting…' : submitLabel}
        </Button>
        {onDone && (
          <Button size="sm" variant="quiet" onClick={onDone}>
            Cancel
          </Button>
        )}
      </div>
    </form>
  );
}
