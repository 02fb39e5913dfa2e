// "What will print": the saved revision's PNG from the render route shown at its physical size
// (CSS millimetres), with its pixel size and dpi; for unsaved 2D changes, the browser's drawing
// at the printed size; for unsaved 3D changes, a plain note that the file is of the saved revision.
import { useEffect, useMemo, useState } from 'react';
import { Button } from '../../../components/ui/button';
import { useRender } from '../api/get-render';
import { pixelsFor } from '../utils/print-size';
import type { DrawnScene } from '../worker/scene-messages';
import { FlatFigure } from './flat-figure';

interface PrintPreviewProps {
  figureId: number;
  revision: number;
  /** Print settings of the saved revision and of the spec being edited (house style applied). */
  saved: { widthMm: number; heightMm: number; dpi: number; background: 'transparent' | 'white' };
  current: { widthMm: number; heightMm: number; dpi: number; background: 'transparent' | 'white' };
  unsaved: boolean;
  /** The browser's drawing of the edited spec, for 2D figures. */
  flatScene: DrawnScene | null;
}

const CHECKER = 'repeating-conic-gradient(#e7e5e4 0% 25%, #ffffff 0% 50%) 0 0 / 12px 12px';

function SavedPng({
  figureId,
  revision,
  saved,
}: Pick<PrintPreviewProps, 'figureId' | 'revision' | 'saved'>) {
  const render = useRender(figureId, { format: 'png', revision });
  const url = useMemo(
    () => (render.data ? URL.createObjectURL(render.data.blob) : null),
    [render.data],
  );
  useEffect(() => () => (url ? URL.revokeObjectURL(url) : undefined), [url]);
  const [pixels, setPixels] = useState<{ w: number; h: number } | null>(null);
  if (render.isPending)
    return (
      <p role="status" className="text-sm text-stone-700">
        Making the print file of revision {revision}…
      </p>
    );
  if (render.isError)
    return (
      <p role="alert" className="text-sm text-red-800">
        The print file could not be made: {render.error.message}
      </p>
    );
  return (
    <figure className="space-y-2">
      <div
        className="overflow-auto rounded border border-stone-200 p-3"
        style={{ background: saved.background === 'white' ? '#fff' : CHECKER }}
      >
        {url ? (
          <img
            src={url}
            alt={`Revision ${revision} as it will print`}
            onLoad={(e) =>
              setPixels({ w: e.currentTarget.naturalWidth, h: e.currentTarget.naturalHeight })
            }
            style={{ width: `${saved.widthMm}mm`, height: `${saved.heightMm}mm`, maxWidth: 'none' }}
          />
        ) : null}
      </div>
      <figcaption className="text-xs text-stone-700">
        Revision {revision}: {saved.widthMm} × {saved.heightMm} mm at {saved.dpi} dpi
        {pixels
          ? `, ${pixels.w} × ${pixels.h} px`
          : ` (${pixelsFor(saved.widthMm, saved.dpi)} × ${pixelsFor(saved.heightMm, saved.dpi)} px)`}
        . Shown at its printed size; how true that is depends on the screen.
      </figcaption>
      {render.data.notes.length > 0 ? (
        <ul className="list-disc pl-4 text-xs text-amber-900" aria-label="Notes on the print file">
          {render.data.notes.map((n) => (
            <li key={n}>{n}</li>
          ))}
        </ul>
      ) : null}
    </figure>
  );
}

export function PrintPreview({
  figureId,
  revision,
  saved,
  current,
  unsaved,
  flatScene,
}: PrintPreviewProps) {
  const [shown, setShown] = useState(false);
  if (!shown)
    return (
      <div className="flex flex-wrap items-center gap-3">
        <Button onClick={() => setShown(true)}>Show what will print</Button>
        <p className="text-xs text-stone-600">
          {current.widthMm} × {current.heightMm} mm at {current.dpi} dpi ={' '}
          {pixelsFor(current.widthMm, current.dpi)} × {pixelsFor(current.heightMm, current.dpi)} px.
        </p>
      </div>
    );
  if (unsaved && flatScene)
    return (
      <figure className="space-y-2">
        <div
          className="overflow-auto rounded border border-stone-200 p-3"
          style={{ background: current.background === 'white' ? '#fff' : CHECKER }}
        >
          <FlatFigure svg={flatScene.svg} printSize={current} />
        </div>
        <figcaption className="text-xs text-stone-700">
          Your unsaved changes, drawn in the browser at the printed size: {current.widthMm} ×{' '}
          {current.heightMm} mm; at {current.dpi} dpi the PNG will be{' '}
          {pixelsFor(current.widthMm, current.dpi)} × {pixelsFor(current.heightMm, current.dpi)} px.
          Save to make the print file.
        </figcaption>
      </figure>
    );
  return (
    <div className="space-y-2">
      {unsaved ? (
        <p role="note" className="rounded-md bg-stone-100 p-2 text-xs text-stone-800">
          This is revision {revision} as last saved; your unsaved changes are not in it. Save to see
          them as they will print.
        </p>
      ) : null}
      <SavedPng figureId={figureId} revision={revision} saved={saved} />
    </div>
  );
}
