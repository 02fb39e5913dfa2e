// Title, number, caption and alt text of a figure. Editors save them as a new revision on top
// of the revision they started from; if someone else saved in between, nothing is lost: the
// form says who saved which revision and offers to load theirs or apply these changes on top.
import { useState, type FormEvent } from 'react';
import { Button } from '../../../components/ui/button';
import { TextAreaField, TextField } from '../../../components/ui/form-field';
import { FormAlert, SavedNote } from '../../../components/ui/status';
import {
  apiFieldErrors,
  formErrorMessage,
  validateForm,
  type FieldErrors,
} from '../../../lib/form-errors';
import { updateFigureBody, type Figure } from '../../../../shared/api/schemas';
import { isApiError } from '../../../lib/api-client';
import { currentRevisionFromConflict, useUpdateFigure } from '../api/update-figure';

interface Details {
  title: string;
  number: string;
  caption: string;
  altText: string;
}
const FIELDS = ['title', 'number', 'caption', 'altText', 'message'] as const;

const detailsOf = (f: Figure): Details => ({
  title: f.title,
  number: f.number,
  caption: f.caption,
  altText: f.altText,
});
const changedFields = (from: Details, to: Details): Partial<Details> =>
  Object.fromEntries(
    Object.entries(to).filter(([key, value]) => from[key as keyof Details] !== value),
  );

/** What the user has typed, and the revision it was typed over. */
interface Draft {
  base: number;
  original: Details;
  values: Details;
}

const FIELD_NAMES: Record<keyof Details, string> = {
  title: 'title',
  number: 'number',
  caption: 'caption',
  altText: 'alt text',
};

function fieldList(fields: Partial<Details>): string {
  const names = Object.keys(fields).map((key) => FIELD_NAMES[key as keyof Details]);
  return names.length <= 1
    ? (names[0] ?? '')
    : `${names.slice(0, -1).join(', ')} and ${names[names.length - 1]}`;
}

function StaleNotice({
  revision,
  savedBy,
  theirChanges,
  myChanges,
  busy,
  onLoadTheirs,
  onApplyMine,
}: {
  revision: number;
  savedBy: string | null;
  /** What the newer revision changed since the one this draft started from, when it is loaded. */
  theirChanges: Partial<Details> | null;
  myChanges: Partial<Details>;
  busy: boolean;
  onLoadTheirs: () => void;
  onApplyMine: () => void;
}) {
  return (
    <div
      role="alert"
      className="space-y-3 rounded-lg border border-amber-300 bg-amber-50 p-4 text-sm text-amber-950"
    >
      <p className="font-semibold">
        {savedBy
          ? `${savedBy} saved revision ${revision} meanwhile.`
          : `Someone saved revision ${revision} meanwhile.`}
      </p>
      <p>
        {theirChanges && Object.keys(theirChanges).length > 0
          ? `Revision ${revision} changed the ${fieldList(theirChanges)}. `
          : ''}
        Your change to the {fieldList(myChanges)} is not saved yet. Load revision {revision} and
        drop your change, or save your change on top of it as a new revision (keeping everything
        else from revision {revision}).
      </p>
      <div className="flex flex-wrap gap-2">
        <Button size="sm" onClick={onLoadTheirs} disabled={busy}>
          Load revision {revision} (drop my changes)
        </Button>
        <Button size="sm" variant="primary" onClick={onApplyMine} busy={busy}>
          Save mine on top of revision {revision}
        </Button>
      </div>
    </div>
  );
}

export function FigureDetailsForm({ figure }: { figure: Figure }) {
  const update = useUpdateFigure(figure.id, figure.projectId);
  const [draft, setDraft] = useState<Draft | null>(null);
  const [message, setMessage] = useState('');
  const [clientErrors, setClientErrors] = useState<FieldErrors>({});
  const [savedRevision, setSavedRevision] = useState<number | null>(null);

  const dirty =
    draft !== null && Object.keys(changedFields(draft.original, draft.values)).length > 0;
  // An untouched form simply follows the latest revision.
  const active = draft && (dirty || draft.base === figure.revision) ? draft : null;
  const values = active?.values ?? detailsOf(figure);
  const base = active?.base ?? figure.revision;
  const original = active?.original ?? detailsOf(figure);
  const latest = Math.max(figure.revision, currentRevisionFromConflict(update.error) ?? 0);
  const stale = dirty && latest > base;
  const errors = { ...apiFieldErrors(update.error), ...clientErrors };

  const edit = (key: keyof Details) => (e: { target: { value: string } }) => {
    setSavedRevision(null);
    const start: Draft = active ?? {
      base: figure.revision,
      original: detailsOf(figure),
      values: detailsOf(figure),
    };
    setDraft({ ...start, values: { ...start.values, [key]: e.target.value } });
  };

  function save(baseRevision: number) {
    if (!active) return;
    const checked = validateForm(updateFigureBody, {
      baseRevision,
      message,
      ...changedFields(active.original, active.values),
    });
    if (!checked.ok) return setClientErrors(checked.fields);
    setClientErrors({});
    update.mutate(checked.data, {
      onSuccess: (saved) => {
        setDraft(null);
        setMessage('');
        setSavedRevision(saved.revision);
        update.reset();
      },
    });
  }

  function submit(event: FormEvent) {
    event.preventDefault();
    save(base);
  }

  function loadTheirs() {
    setDraft(null);
    setClientErrors({});
    update.reset();
  }

  const conflictUnresolved = isApiError(update.error, 'stale_revision') && !stale;

  return (
    <form onSubmit={submit} noValidate className="space-y-4" aria-label="Figure details">
      {stale && (
        <StaleNotice
          revision={latest}
          savedBy={figure.revision === latest ? figure.updatedBy : null}
          theirChanges={
            figure.revision === latest ? changedFields(original, detailsOf(figure)) : null
          }
          myChanges={changedFields(original, values)}
          busy={update.isPending}
          onLoadTheirs={loadTheirs}
          onApplyMine={() => save(latest)}
        />
      )}
      {!stale && (
        <FormAlert
          message={
            conflictUnresolved ? update.error!.message : formErrorMessage(update.error, FIELDS)
          }
        />
      )}
      <div className="grid gap-4 sm:grid-cols-[8rem_1fr]">
        <TextField
          label="Number"
          name="number"
          value={values.number}
          onChange={edit('number')}
          error={errors.number}
          hint="e.g. 4.2a"
        />
        <TextField
          label="Title"
          name="title"
          required
          value={values.title}
          onChange={edit('title')}
          error={errors.title}
        />
      </div>
      <TextAreaField
        label="Caption"
        name="caption"
        rows={4}
        value={values.caption}
        onChange={edit('caption')}
        error={errors.caption}
      />
      <TextAreaField
        label="Alt text"
        name="altText"
        rows={3}
        value={values.altText}
        onChange={edit('altText')}
        error={errors.altText}
        hint="What the figure shows, for readers who cannot see it. Exported with the figure."
      />
      <TextField
        label="Note for this revision"
        name="message"
        value={message}
        onChange={(e) => setMessage(e.target.value)}
        error={errors.message}
        hint="Optional; shown in the revision list."
      />
      <div className="flex flex-wrap items-center gap-4">
        <Button type="submit" variant="primary" busy={update.isPending} disabled={!dirty || stale}>
          {update.isPending ? 'Saving…' : 'Save as new revision'}
        </Button>
        {dirty && !stale && (
          <Button variant="quiet" onClick={loadTheirs}>
            Discard changes
          </Button>
        )}
        <span className="text-sm text-stone-600">Editing on top of revision {base}</span>
        {savedRevision !== null && !dirty && (
          <SavedNote>Saved as revision {savedRevision}.</SavedNote>
        )}
      </div>
    </form>
  );
}
