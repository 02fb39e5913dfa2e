// The name co-authors see beside one's revisions, comments and audit entries.
import { useState, type FormEvent } from 'react';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/form-field';
import { FormAlert, SavedNote } from '../../../components/ui/status';
import { useValidatedSubmit } from '../../../hooks/use-validated-submit';
import { formErrorMessage } from '../../../lib/form-errors';
import { updateAccountBody, type Account } from '../../../../shared/api/schemas';
import { useUpdateAccount } from '../api/update-account';

export function AccountNameForm({
  account,
  onSaved,
}: {
  account: Account;
  /** The name also shows in the page header, which reads it from the session. */
  onSaved: () => void;
}) {
  const update = useUpdateAccount();
  const [name, setName] = useState(account.user.name);
  const { errors, submit } = useValidatedSubmit(updateAccountBody, update);

  function onSubmit(event: FormEvent) {
    event.preventDefault();
    submit({ name }, onSaved);
  }

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4" aria-label="Your name">
      <FormAlert message={formErrorMessage(update.error, ['name'])} />
      <div className="flex flex-wrap items-start gap-4">
        <TextField
          label="Name"
          name="name"
          autoComplete="name"
          value={name}
          onChange={(e) => {
            update.reset();
            setName(e.target.value);
          }}
          error={errors.name}
          hint="Shown to co-authors beside your revisions and comments."
          className="min-w-64 flex-1"
        />
        <Button type="submit" variant="primary" busy={update.isPending} className="mt-6">
          {update.isPending ? 'Saving…' : 'Save name'}
        </Button>
      </div>
      {update.isSuccess && <SavedNote>Your name is now {update.data.user.name}.</SavedNote>}
    </form>
  );
}
