// On the Data page: which radial figures draw which uploaded data sets, and (for editors) adding a
// data set to a radial figure or taking it off. Each change saves a new revision of the figure.
// It combines the figures and datasets features, so it lives with the routes.
import { useQueries, useQueryClient } from '@tanstack/react-query';
import { useState, type FormEvent } from 'react';
import { Link } from 'react-router';
import { Button } from '../components/ui/button';
import { SelectField, TextField } from '../components/ui/form-field';
import { FormAlert, SavedNote } from '../components/ui/status';
import { useDatasets } from '../features/datasets/api/get-datasets';
import { getFigureQueryOptions } from '../features/figures/api/get-figure';
import { figuresQueryKey, useFigures } from '../features/figures/api/get-figures';
import { updateFigure } from '../features/figures/api/update-figure';
import type { Figure } from '../../shared/api/schemas';
import { MAX_FIGURE_DATASETS, type FigureSpec } from '../../shared/spec/figure-spec';

type DatasetRef = { id: number; label?: string };

const figureName = (f: Pick<Figure, 'number' | 'title'>) =>
  f.number ? `Figure ${f.number}: ${f.title}` : f.title;

function refsOf(spec: FigureSpec): DatasetRef[] {
  return spec.kind.type === 'radial' ? (spec.kind.datasets ?? []) : [];
}

function withRefs(spec: FigureSpec, refs: DatasetRef[]): FigureSpec {
  if (spec.kind.type !== 'radial') return spec;
  return { ...spec, kind: { ...spec.kind, datasets: refs.length ? refs : undefined } };
}

export function FigureDataLinks({ projectId, canEdit }: { projectId: number; canEdit: boolean }) {
  const queryClient = useQueryClient();
  const figures = useFigures(projectId);
  const datasets = useDatasets(projectId);
  const radial = (figures.data ?? []).filter((f) => f.kind === 'radial');
  const details = useQueries({ queries: radial.map((f) => getFigureQueryOptions(f.id)) });
  const [datasetId, setDatasetId] = useState('');
  const [figureId, setFigureId] = useState('');
  const [label, setLabel] = useState('');
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const [done, setDone] = useState<string | null>(null);

  const nameOf = (id: number) => datasets.data?.find((d) => d.id === id)?.name ?? `data set ${id}`;
  const drawing = details.flatMap((q) => (q.data && refsOf(q.data.spec).length ? [q.data] : []));

  /** Saves the figure's current revision with new data set references. */
  async function save(figure: Figure, refs: DatasetRef[], message: string) {
    setBusy(true);
    setError(null);
    setDone(null);
    try {
      const saved = await updateFigure(figure.id, {
        baseRevision: figure.revision,
        spec: withRefs(figure.spec, refs),
        message,
      });
      queryClient.setQueryData(getFigureQueryOptions(figure.id).queryKey, saved);
      await queryClient.invalidateQueries({ queryKey: figuresQueryKey });
      setDone(`${figureName(saved)}: saved as revision ${saved.revision}.`);
    } catch (err) {
      setError((err as Error).message);
    } finally {
      setBusy(false);
    }
  }

  async function add(e: FormEvent) {
    e.preventDefault();
    const id = Number(datasetId);
    const figure = await queryClient.fetchQuery({
      ...getFigureQueryOptions(Number(figureId)),
      staleTime: 0,
    });
    const refs = refsOf(figure.spec).filter((r) => r.id !== id);
    if (refs.length >= MAX_FIGURE_DATASETS) {
      setError(`a figure draws at most ${MAX_FIGURE_DATASETS} data sets; take one off first`);
      return;
    }
    await save(
      figure,
      [...refs, { id, ...(label.trim() ? { label: label.trim() } : {}) }],
      `draws data set "${nameOf(id)}"`,
    );
  }

  return (
    <div className="space-y-4">
      {drawing.length === 0 ? (
        <p className="text-sm text-stone-600">No figure draws uploaded data yet.</p>
      ) : (
        <ul className="space-y-2 text-sm">
          {drawing.map((f) => (
            <li key={f.id}>
              <Link to={`/figures/${f.id}`} className="font-semibold underline underline-offset-2">
                {figureName(f)}
              </Link>
              <ul className="mt-1 flex flex-wrap gap-2">
                {refsOf(f.spec).map((r) => (
                  <li
                    key={r.id}
                    className="flex items-center gap-1 rounded-md border border-stone-200 px-2 py-0.5"
                  >
                    {nameOf(r.id)}
                    {r.label && <span className="text-stone-600">(shown as “{r.label}”)</span>}
                    {canEdit && (
                      <Button
                        size="sm"
                        variant="quiet"
                        busy={busy}
                        aria-label={`Take ${nameOf(r.id)} off ${figureName(f)}`}
                        onClick={() =>
                          void save(
                            f,
                            refsOf(f.spec).filter((x) => x.id !== r.id),
                            `no longer draws data set "${nameOf(r.id)}"`,
                          )
                        }
                      >
                        Take off
                      </Button>
                    )}
                  </li>
                ))}
              </ul>
            </li>
          ))}
        </ul>
      )}
      {canEdit && radial.length > 0 && (datasets.data?.length ?? 0) > 0 && (
        <form onSubmit={(e) => void add(e)} className="grid gap-4 sm:grid-cols-3" noValidate>
          <SelectField
            label="Data set"
            value={datasetId}
            onChange={(e) => setDatasetId(e.target.value)}
            required
          >
            <option value="">Choose…</option>
            {datasets.data?.map((d) => (
              <option key={d.id} value={d.id}>
                {d.name}
              </option>
            ))}
          </SelectField>
          <SelectField
            label="Radial figure"
            value={figureId}
            onChange={(e) => setFigureId(e.target.value)}
            required
          >
            <option value="">Choose…</option>
            {radial.map((f) => (
              <option key={f.id} value={f.id}>
                {figureName(f)}
              </option>
            ))}
          </SelectField>
          <TextField
            label="Legend label (optional)"
            value={label}
            maxLength={80}
            onChange={(e) => setLabel(e.target.value)}
            hint="The data set’s name when empty."
          />
          <div className="sm:col-span-3">
            <Button type="submit" variant="primary" busy={busy} disabled={!datasetId || !figureId}>
              Draw in figure
            </Button>
          </div>
        </form>
      )}
      <FormAlert message={error} />
      {done && <SavedNote>{done}</SavedNote>}
    </div>
  );
}
