// Starts an export run: which figures (all, the approved ones, or a chosen few) and which formats.
// Validated with the same schema the server uses, so a missing format or an empty choice is named
// beside its field before anything is sent.
import { useState, type FormEvent } from 'react';
import { Button } from '../../../components/ui/button';
import { CheckboxField } from '../../../components/ui/checkbox-field';
import { FormAlert, SavedNote } from '../../../components/ui/status';
import { useValidatedSubmit } from '../../../hooks/use-validated-submit';
import { formErrorMessage } from '../../../lib/form-errors';
import {
  createExportBody,
  exportFormatSchema,
  type FigureSummary,
} from '../../../../shared/api/schemas';
import { cn } from '../../../utils/cn';
import { sentence } from '../../../utils/sentence';
import { useStartExport } from '../api/start-export';

type Mode = 'all' | 'approved' | 'selected';
type Format = (typeof exportFormatSchema.options)[number];

const formatNames: Record<Format, string> = {
  png: 'PNG (raster)',
  tiff: 'TIFF (raster, for print)',
  pdf: 'PDF (vector where the figure is 2D)',
  svg: 'SVG (vector, 2D figures)',
};

const FIELDS = ['selection', 'selection.ids', 'formats'] as const;

interface StartExportFormProps {
  projectId: number;
  figures: Pick<FigureSummary, 'id' | 'number' | 'title' | 'status'>[];
  /** Figures chosen on the figure table, if the user came from there. */
  initialIds?: number[];
}

function FieldError({ id, message }: { id: string; message?: string }) {
  if (!message) return null;
  return (
    <p id={id} className="text-sm text-red-700">
      {sentence(message)}
    </p>
  );
}

export function StartExportForm({ projectId, figures, initialIds = [] }: StartExportFormProps) {
  const start = useStartExport(projectId);
  const { errors, submit } = useValidatedSubmit(createExportBody, start);
  const known = new Set(figures.map((f) => f.id));
  const [mode, setMode] = useState<Mode>(initialIds.length > 0 ? 'selected' : 'approved');
  const [chosen, setChosen] = useState<ReadonlySet<number>>(
    () => new Set(initialIds.filter((id) => known.has(id))),
  );
  const [formats, setFormats] = useState<ReadonlySet<Format>>(new Set(['pdf']));
  const approvedCount = figures.filter((f) => f.status === 'approved').length;

  function toggle<T>(set: ReadonlySet<T>, value: T, on: boolean): Set<T> {
    const next = new Set(set);
    if (on) next.add(value);
    else next.delete(value);
    return next;
  }

  function onSubmit(event: FormEvent) {
    event.preventDefault();
    const selection =
      mode === 'selected'
        ? { mode, ids: figures.filter((f) => chosen.has(f.id)).map((f) => f.id) }
        : { mode };
    // Formats in a fixed order, so the same choice always reads the same in the run list.
    const ordered = exportFormatSchema.options.filter((f) => formats.has(f));
    submit({ selection, formats: ordered });
  }

  const selectionError = errors['selection.ids'] ?? errors.selection;
  const modes: { value: Mode; label: string }[] = [
    { value: 'all', label: `All figures (${figures.length})` },
    { value: 'approved', label: `Approved figures only (${approvedCount})` },
    { value: 'selected', label: 'Chosen figures' },
  ];

  return (
    <form onSubmit={onSubmit} noValidate aria-label="Start an export" className="space-y-5">
      <FormAlert message={formErrorMessage(start.error, FIELDS)} />
      <fieldset className="space-y-2" aria-describedby={selectionError ? 'export-selection-error' : undefined}>
        <legend className="text-sm font-semibold text-stone-800">Figures</legend>
        <div className="flex flex-wrap gap-x-6 gap-y-2">
          {modes.map((m) => (
            <label key={m.value} className="flex items-center gap-2 text-sm text-stone-800">
              <input
                type="radio"
                name="export-mode"
                value={m.value}
                checked={mode === m.value}
                onChange={() => setMode(m.value)}
                className="size-4 accent-accent-600"
              />
              {m.label}
            </label>
          ))}
        </div>
        {mode === 'selected' && (
          <div
            className={cn(
              'max-h-64 space-y-1 overflow-y-auto rounded-md border bg-stone-50 p-3',
              selectionError ? 'border-red-600' : 'border-stone-200',
            )}
          >
            {figures.map((f) => (
              <CheckboxField
                key={f.id}
                label={
                  <>
                    <span className="w-12 tabular-nums text-stone-600">{f.number || '—'}</span>
                    {f.title}
                  </>
                }
                checked={chosen.has(f.id)}
                onChange={(e) => setChosen((c) => toggle(c, f.id, e.target.checked))}
              />
            ))}
          </div>
        )}
        <FieldError id="export-selection-error" message={selectionError} />
      </fieldset>

      <fieldset className="space-y-2" aria-describedby={errors.formats ? 'export-formats-error' : undefined}>
        <legend className="text-sm font-semibold text-stone-800">Formats</legend>
        <div className="flex flex-wrap gap-x-6 gap-y-2">
          {exportFormatSchema.options.map((f) => (
            <CheckboxField
              key={f}
              label={formatNames[f]}
              checked={formats.has(f)}
              onChange={(e) => setFormats((s) => toggle(s, f, e.target.checked))}
            />
          ))}
        </div>
        <FieldError id="export-formats-error" message={errors.formats} />
      </fieldset>

      <div className="flex flex-wrap items-center gap-3">
        <Button type="submit" variant="primary" busy={start.isPending}>
          {start.isPending ? 'Starting…' : 'Start export'}
        </Button>
        {start.isSuccess && (
          <SavedNote>
            Export {start.data.id} queued: {start.data.total}{' '}
            {start.data.total === 1 ? 'figure' : 'figures'}. Its progress shows below; you will
            also get an e-mail when it finishes.
          </SavedNote>
        )}
      </div>
    </form>
  );
}
