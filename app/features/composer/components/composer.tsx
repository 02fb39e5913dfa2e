// The figure composer: controls on the left (orbital, figure, camera, look, print), the live
// preview and its read-out on the right, and above them undo, redo, save as a new revision,
// duplicate and download. Editors change the figure; everyone else sees the same screen read-only.
// The page supplies saving, duplicating and the 3D view, which belong to other features.
import { useDeferredValue, useEffect, useMemo, useState, type ReactNode } from 'react';
import { Button } from '../../../components/ui/button';
import type { Figure } from '../../../../shared/api/schemas';
import type { FigureSpec } from '../../../../shared/spec/figure-spec';
import type { HouseStyle } from '../../../../shared/spec/house-style';
import {
  resolveFigureSpec,
  type ResolvedFigureSpec,
} from '../../../../shared/spec/resolve-figure-spec';
import { useFigureScene } from '../hooks/use-figure-scene';
import { useSpecHistory } from '../hooks/use-spec-history';
import { isThreeDimensional } from '../utils/figure-dimensions';
import { FIGURE_PRESETS } from '../utils/figure-presets';
import { applyHouseStyle, houseStyleOverrides } from '../utils/house-style-overrides';
import { specChanges } from '../utils/spec-diff';
import { canRedo, canUndo, sameSpec } from '../utils/spec-history';
import { stateFacts } from '../utils/state-facts';
import { ChoiceField } from './choice-field';
import { ControlTabs } from './control-tabs';
import { DownloadMenu } from './download-menu';
import { FlatFigure } from './flat-figure';
import { HouseStylePanel } from './house-style-panel';
import { KindControls } from './kind-controls';
import { OrbitalControls } from './orbital-controls';
import { PrintPreview } from './print-preview';
import { StaleNotice } from './stale-notice';
import { StateReadout } from './state-readout';
import { LookControls, PrintControls } from './style-controls';
import { ViewControls } from './view-controls';

export interface ComposerProps {
  figure: Figure;
  houseStyle: HouseStyle;
  canEdit: boolean;
  /** Why the figure is read-only, shown to those who cannot edit. */
  readOnlyReason: string;
  /** Saves the spec as a new revision on top of `baseRevision`; rejects with the server's error. */
  save: (spec: FigureSpec, baseRevision: number, message: string) => Promise<Figure>;
  /** Makes a new figure from this spec (the page opens it). */
  duplicate: (spec: FigureSpec) => Promise<void>;
  /** The 3D view of a resolved spec; turning it reports the new view. */
  render3d: (
    spec: ResolvedFigureSpec,
    options: { onViewChange?: (view: FigureSpec['view']) => void; viewOnlyChange: boolean },
  ) => ReactNode;
}

type Notice = { kind: 'saved'; revision: number } | { kind: 'error'; message: string } | null;

function errorCode(error: unknown): string | null {
  return typeof error === 'object' &&
    error !== null &&
    'code' in error &&
    typeof error.code === 'string'
    ? error.code
    : null;
}

export function Composer({
  figure,
  houseStyle,
  canEdit,
  readOnlyReason,
  save,
  duplicate,
  render3d,
}: ComposerProps) {
  const { history, dirty, edit, undo, redo, load, allowLeave } = useSpecHistory(
    figure.spec,
    figure.revision,
    canEdit,
  );
  const [tab, setTab] = useState('orbital');
  const [message, setMessage] = useState('');
  const [busy, setBusy] = useState<'save' | 'duplicate' | null>(null);
  const [notice, setNotice] = useState<Notice>(null);
  const [preset, setPreset] = useState(FIGURE_PRESETS[0].id);
  const readOnly = !canEdit;
  const spec = history.present;

  // A newer revision arrived (someone saved, or the details form did): follow it when nothing is
  // unsaved; otherwise the notice below lets the user choose.
  const newer = figure.revision > history.savedRevision;
  // A newer revision that holds exactly what is on screen (a kept view) is simply taken as saved.
  useEffect(() => {
    if (!newer) return;
    const same = sameSpec(figure.spec, spec);
    if (!dirty || same) load(figure.spec, figure.revision, same);
  }, [newer, dirty, figure.spec, figure.revision, spec, load]);

  const deferred = useDeferredValue(spec);
  const resolved = useMemo(() => resolveFigureSpec(deferred, houseStyle), [deferred, houseStyle]);
  const threeD = isThreeDimensional(resolved.kind);
  // Once shown, the 3D view stays mounted (hidden while a 2D figure is previewed): taking the
  // WebGL canvas and its labels down and up again on every switch of kind is slow and fragile.
  const [kept3d, setKept3d] = useState<ResolvedFigureSpec | null>(threeD ? resolved : null);
  if (threeD && kept3d !== resolved) setKept3d(resolved);
  const spec3d = threeD ? resolved : kept3d;
  const flat = useFigureScene(threeD ? null : resolved);
  // The controls only make valid states, but a stored spec could still hold one the physics refuses.
  const facts = useMemo(() => {
    try {
      return stateFacts(deferred);
    } catch {
      return null;
    }
  }, [deferred]);
  const overrides = useMemo(() => houseStyleOverrides(spec, houseStyle), [spec, houseStyle]);
  const savedResolved = useMemo(
    () => resolveFigureSpec(history.saved, houseStyle),
    [history.saved, houseStyle],
  );
  const pending = deferred !== spec || flat.status === 'working';

  async function doSave(base: number) {
    setBusy('save');
    setNotice(null);
    try {
      const saved = await save(spec, base, message);
      load(saved.spec, saved.revision, true);
      setMessage('');
      setNotice({ kind: 'saved', revision: saved.revision });
    } catch (error) {
      // A stale save shows the notice about the newer revision once the page has fetched it.
      if (errorCode(error) !== 'stale_revision')
        setNotice({
          kind: 'error',
          message: error instanceof Error ? error.message : String(error),
        });
    } finally {
      setBusy(null);
    }
  }

  async function doDuplicate() {
    setBusy('duplicate');
    try {
      allowLeave();
      await duplicate(spec);
    } catch (error) {
      setNotice({ kind: 'error', message: error instanceof Error ? error.message : String(error) });
    } finally {
      setBusy(null);
    }
  }

  const onViewChange = canEdit
    ? (view: FigureSpec['view']) => edit({ ...spec, view }, 'view')
    : undefined;
  const viewOnlyChange = dirty && sameSpec({ ...spec, view: history.saved.view }, history.saved);

  const tabs = [
    {
      id: 'orbital',
      label: 'Orbital',
      content: <OrbitalControls spec={spec} onEdit={edit} readOnly={readOnly} />,
    },
    {
      id: 'figure',
      label: 'Figure',
      content: <KindControls spec={spec} onEdit={edit} readOnly={readOnly} />,
    },
    {
      id: 'camera',
      label: 'Camera',
      content: (
        <ViewControls
          spec={spec}
          onEdit={edit}
          readOnly={readOnly}
          threeDimensional={isThreeDimensional(spec.kind)}
        />
      ),
    },
    {
      id: 'look',
      label: 'Look',
      content: (
        <LookControls spec={spec} houseStyle={houseStyle} onEdit={edit} readOnly={readOnly} />
      ),
    },
    {
      id: 'print',
      label: 'Print',
      content: (
        <PrintControls spec={spec} houseStyle={houseStyle} onEdit={edit} readOnly={readOnly} />
      ),
    },
  ];

  return (
    <div className="space-y-4">
      <div
        className="flex flex-wrap items-center gap-2 border-b border-stone-200 pb-3"
        role="toolbar"
        aria-label="Figure actions"
      >
        {canEdit ? (
          <>
            <Button
              size="sm"
              onClick={undo}
              disabled={!canUndo(history)}
              aria-keyshortcuts="Control+Z Meta+Z"
              title="Undo (Ctrl/⌘+Z)"
            >
              Undo
            </Button>
            <Button
              size="sm"
              onClick={redo}
              disabled={!canRedo(history)}
              aria-keyshortcuts="Shift+Control+Z Shift+Meta+Z"
              title="Redo (Shift+Ctrl/⌘+Z)"
            >
              Redo
            </Button>
            <span className="mx-1 h-5 w-px bg-stone-300" aria-hidden="true" />
          </>
        ) : null}
        <p className="mr-auto text-sm" aria-live="polite">
          {dirty ? (
            <span className="rounded bg-amber-100 px-2 py-0.5 font-semibold text-amber-900">
              Unsaved changes
            </span>
          ) : (
            <span className="text-stone-600">
              Revision {history.savedRevision}, no unsaved changes
            </span>
          )}
        </p>
        <DownloadMenu figureId={figure.id} revision={history.savedRevision} unsaved={dirty} />
        {/* The page header duplicates the saved figure; this one carries the unsaved changes along. */}
        {canEdit && dirty ? (
          <Button size="sm" onClick={() => void doDuplicate()} busy={busy === 'duplicate'}>
            Duplicate with these changes
          </Button>
        ) : null}
      </div>

      {canEdit && newer && dirty ? (
        <StaleNotice
          revision={figure.revision}
          savedBy={figure.updatedBy}
          theirChanges={specChanges(history.saved, figure.spec)}
          busy={busy === 'save'}
          onLoadTheirs={() => load(figure.spec, figure.revision)}
          onSaveMine={() => void doSave(figure.revision)}
        />
      ) : null}
      {notice?.kind === 'saved' && !dirty ? (
        <p role="status" className="rounded-md bg-emerald-50 px-3 py-2 text-sm text-emerald-900">
          Figure saved as revision {notice.revision}.
        </p>
      ) : null}
      {notice?.kind === 'error' ? (
        <p role="alert" className="rounded-md bg-red-50 px-3 py-2 text-sm text-red-800">
          {notice.message}
        </p>
      ) : null}
      {readOnly ? <p className="text-sm text-stone-700">{readOnlyReason}</p> : null}

      <div className="grid gap-6 lg:grid-cols-[minmax(0,24rem)_minmax(0,1fr)]">
        <div className="space-y-4">
          {canEdit ? (
            <div className="flex items-end gap-2">
              <ChoiceField
                label="Start from a preset"
                className="flex-1"
                value={preset}
                choices={FIGURE_PRESETS.map((p) => ({ value: p.id, label: p.name }))}
                onChange={setPreset}
              />
              <Button
                size="sm"
                className="mb-0.5"
                onClick={() => {
                  const p = FIGURE_PRESETS.find((x) => x.id === preset);
                  if (p) edit(p.apply(spec), `preset`);
                }}
              >
                Apply
              </Button>
            </div>
          ) : null}
          <ControlTabs tabs={tabs} selected={tab} onSelect={setTab} />
        </div>

        <section aria-labelledby="composer-preview-title" className="min-w-0 space-y-4">
          <div className="flex items-baseline justify-between gap-3">
            <h3 id="composer-preview-title" className="text-sm font-semibold text-stone-800">
              Preview
            </h3>
            {threeD ? null : (
              <p
                role="status"
                data-figure-ready={!pending && flat.status === 'ready'}
                className="text-xs text-stone-600"
              >
                {pending
                  ? 'Updating the preview…'
                  : flat.status === 'ready'
                    ? `Figure ready: ${flat.scene?.title ?? ''}`
                    : ''}
              </p>
            )}
          </div>
          {spec3d ? (
            <div hidden={!threeD}>{render3d(spec3d, { onViewChange, viewOnlyChange })}</div>
          ) : null}
          {threeD ? null : (
            <div className="relative rounded border border-stone-200 bg-white p-2">
              {flat.scene ? (
                <FlatFigure svg={flat.scene.svg} />
              ) : (
                <p className="p-6 text-sm text-stone-600">Drawing…</p>
              )}
              {pending ? (
                <div
                  className="absolute inset-x-0 top-0 h-1 animate-pulse bg-accent-200"
                  aria-hidden="true"
                />
              ) : null}
              {flat.status === 'error' ? (
                <p role="alert" className="mt-2 rounded bg-red-50 p-2 text-sm text-red-800">
                  This figure cannot be drawn: {flat.error}
                </p>
              ) : null}
            </div>
          )}
          <StateReadout
            facts={facts}
            sceneFacts={threeD ? [] : (flat.scene?.facts ?? [])}
            notes={threeD ? [] : (flat.scene?.notes ?? [])}
            showsState={facts !== null && resolved.kind.type !== 'levels'}
          />
        </section>
      </div>

      {canEdit ? (
        <div className="flex flex-wrap items-end gap-3 rounded-lg border border-stone-200 bg-stone-50 p-3">
          <div className="min-w-64 flex-1 space-y-1">
            <label
              htmlFor="composer-revision-note"
              className="block text-sm font-semibold text-stone-800"
            >
              Revision note
            </label>
            <input
              id="composer-revision-note"
              type="text"
              maxLength={500}
              value={message}
              onChange={(e) => setMessage(e.target.value)}
              placeholder="What changed, in a few words (optional)"
              className="block w-full rounded-md border border-stone-300 bg-white px-2.5 py-1.5 text-sm shadow-xs"
            />
          </div>
          <Button
            variant="primary"
            disabled={!dirty || (newer && dirty)}
            busy={busy === 'save'}
            onClick={() => void doSave(history.savedRevision)}
          >
            {busy === 'save'
              ? 'Saving…'
              : `Save figure as revision ${Math.max(history.savedRevision, figure.revision) + 1}`}
          </Button>
        </div>
      ) : null}

      <div className="grid gap-6 lg:grid-cols-2">
        <section aria-labelledby="composer-house-style-title" className="space-y-2">
          <h3 id="composer-house-style-title" className="text-sm font-semibold text-stone-800">
            House style
          </h3>
          <HouseStylePanel
            overrides={overrides}
            readOnly={readOnly}
            onApply={() => edit(applyHouseStyle(spec), 'house-style')}
          />
        </section>
        <section aria-labelledby="composer-print-title" className="min-w-0 space-y-2">
          <h3 id="composer-print-title" className="text-sm font-semibold text-stone-800">
            What will print
          </h3>
          <PrintPreview
            figureId={figure.id}
            revision={history.savedRevision}
            saved={savedResolved.print}
            current={resolved.print}
            unsaved={dirty}
            flatScene={threeD ? null : flat.scene}
          />
        </section>
      </div>
    </div>
  );
}
