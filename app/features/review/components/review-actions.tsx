// The status changes a member may make now, with a note: "Request changes" needs one (the shared
// schema says so), the others take it if given. A 409 means someone changed the status first: the
// status is fetched again (by the caller) and the server's reason is shown.
import { useState } from 'react';
import type { UseMutationResult } from '@tanstack/react-query';
import { Button } from '../../../components/ui/button';
import { TextAreaField } from '../../../components/ui/form-field';
import { FormAlert, SavedNote } from '../../../components/ui/status';
import { isApiError } from '../../../lib/api-client';
import { formErrorMessage, validateForm, type FieldErrors } from '../../../lib/form-errors';
import { reviewActionBody, type Figure } from '../../../../shared/api/schemas';
import type { ReviewActionInput } from '../api/apply-review-action';
import type { ReviewAction } from '../utils/review-actions';
import { sentence } from '../../../utils/sentence';

interface ReviewActionsProps {
  actions: ReviewAction[];
  revision: number;
  mutation: UseMutationResult<Figure, Error, ReviewActionInput>;
}

const done: Record<ReviewAction, string> = {
  submit: 'Submitted for review.',
  request_changes: 'Changes requested.',
  approve: 'Approved.',
};

export function ReviewActions({ actions, revision, mutation }: ReviewActionsProps) {
  const [note, setNote] = useState('');
  const [errors, setErrors] = useState<FieldErrors>({});
  const [last, setLast] = useState<ReviewAction | null>(null);

  if (actions.length === 0) return null;

  const labels: Record<ReviewAction, string> = {
    submit: 'Submit for review',
    request_changes: 'Request changes',
    approve: `Approve revision ${revision}`,
  };

  function act(action: ReviewAction) {
    const checked = validateForm(reviewActionBody, { action, note });
    setLast(action);
    if (!checked.ok) {
      setErrors(checked.fields);
      return;
    }
    setErrors({});
    mutation.mutate(checked.data, { onSuccess: () => setNote('') });
  }

  const conflict =
    isApiError(mutation.error) && mutation.error.status === 409 ? mutation.error.message : null;

  return (
    <div className="space-y-3">
      <TextAreaField
        label="Note with the status change"
        hint={
          actions.includes('request_changes')
            ? 'Required to request changes, optional otherwise.'
            : 'Optional.'
        }
        value={note}
        onChange={(e) => setNote(e.target.value)}
        error={errors.note}
        rows={2}
      />
      <div className="flex flex-wrap gap-2">
        {actions.map((action) => (
          <Button
            key={action}
            size="sm"
            variant={action === 'approve' || action === 'submit' ? 'primary' : 'secondary'}
            busy={mutation.isPending && last === action}
            disabled={mutation.isPending}
            onClick={() => act(action)}
          >
            {labels[action]}
          </Button>
        ))}
      </div>
      {conflict ? (
        <p
          role="alert"
          className="rounded-md border border-amber-300 bg-amber-50 px-3 py-2 text-sm text-amber-950"
        >
          {sentence(conflict)}. Someone changed the status meanwhile; the status shown
          is now the current one.
        </p>
      ) : (
        <FormAlert message={formErrorMessage(mutation.error, ['note'])} />
      )}
      {mutation.isSuccess && last && <SavedNote>{done[last]}</SavedNote>}
    </div>
  );
}
