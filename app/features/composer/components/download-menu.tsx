// The download menu: the saved revision as PNG, TIFF, TIFF in CMYK, PDF or SVG, made by the
// server's render route; the server's cautions about the file are shown after it arrives.
import { useQueryClient } from '@tanstack/react-query';
import { useEffect, useId, useRef, useState } from 'react';
import { buttonClasses } from '../../../components/ui/button';
import { getRenderQueryOptions, type RenderFormat } from '../api/get-render';

interface Item {
  id: string;
  format: RenderFormat;
  cmyk: boolean;
  label: string;
  detail: string;
}

const ITEMS: readonly Item[] = [
  {
    id: 'png',
    format: 'png',
    cmyk: false,
    label: 'PNG',
    detail: 'raster, sRGB, with the dpi recorded',
  },
  { id: 'tiff', format: 'tiff', cmyk: false, label: 'TIFF', detail: 'raster, sRGB, LZW' },
  {
    id: 'tiff-cmyk',
    format: 'tiff',
    cmyk: true,
    label: 'TIFF in CMYK',
    detail: 'for press; colours shift in the conversion',
  },
  {
    id: 'pdf',
    format: 'pdf',
    cmyk: false,
    label: 'PDF',
    detail: 'fonts embedded; 2D figures as vectors',
  },
  { id: 'svg', format: 'svg', cmyk: false, label: 'SVG', detail: 'vector where the figure is 2D' },
];

const CMYK_NOTE =
  'CMYK files are converted from the screen colours: bright phase colours shift and dull a little. Check a printed proof.';

type Outcome =
  | { kind: 'done'; filename: string; notes: string[]; cmyk: boolean }
  | { kind: 'error'; message: string };

function saveBlob(blob: Blob, filename: string): void {
  const url = URL.createObjectURL(blob);
  const a = document.createElement('a');
  a.href = url;
  a.download = filename;
  document.body.append(a);
  a.click();
  a.remove();
  // Some browsers read the URL after click returns.
  setTimeout(() => URL.revokeObjectURL(url), 60_000);
}

export function DownloadMenu({
  figureId,
  revision,
  unsaved,
}: {
  figureId: number;
  revision: number;
  unsaved: boolean;
}) {
  const queryClient = useQueryClient();
  const [open, setOpen] = useState(false);
  const [busy, setBusy] = useState<string | null>(null);
  const [outcome, setOutcome] = useState<Outcome | null>(null);
  const menuId = useId();
  const buttonRef = useRef<HTMLButtonElement>(null);
  const itemRefs = useRef<(HTMLButtonElement | null)[]>([]);

  useEffect(() => {
    if (open) itemRefs.current[0]?.focus();
  }, [open]);

  // A click anywhere else closes the menu, as menus do.
  const wrapperRef = useRef<HTMLDivElement>(null);
  useEffect(() => {
    if (!open) return;
    const onDown = (event: MouseEvent) => {
      if (!wrapperRef.current?.contains(event.target as Node)) setOpen(false);
    };
    document.addEventListener('mousedown', onDown);
    return () => document.removeEventListener('mousedown', onDown);
  }, [open]);

  async function download(item: Item) {
    setOpen(false);
    buttonRef.current?.focus();
    setBusy(item.label);
    setOutcome(null);
    try {
      const file = await queryClient.fetchQuery(
        getRenderQueryOptions(figureId, {
          format: item.format,
          revision,
          cmyk: item.cmyk,
          download: true,
        }),
      );
      saveBlob(file.blob, file.filename);
      setOutcome({ kind: 'done', filename: file.filename, notes: file.notes, cmyk: item.cmyk });
    } catch (error) {
      setOutcome({
        kind: 'error',
        message: error instanceof Error ? error.message : String(error),
      });
    } finally {
      setBusy(null);
    }
  }

  function onMenuKey(event: React.KeyboardEvent) {
    const items = itemRefs.current.filter((x): x is HTMLButtonElement => x !== null);
    const at = items.indexOf(document.activeElement as HTMLButtonElement);
    const go = (i: number) => items[(i + items.length) % items.length]?.focus();
    if (event.key === 'ArrowDown') go(at + 1);
    else if (event.key === 'ArrowUp') go(at - 1);
    else if (event.key === 'Home') go(0);
    else if (event.key === 'End') go(items.length - 1);
    else if (event.key === 'Escape' || event.key === 'Tab') {
      setOpen(false);
      if (event.key === 'Escape') buttonRef.current?.focus();
      return;
    } else return;
    event.preventDefault();
  }

  return (
    <>
      <div className="relative" ref={wrapperRef}>
        <button
          ref={buttonRef}
          type="button"
          className={buttonClasses('secondary')}
          aria-haspopup="menu"
          aria-expanded={open}
          aria-controls={open ? menuId : undefined}
          aria-busy={busy !== null || undefined}
          disabled={busy !== null}
          onClick={() => setOpen((o) => !o)}
        >
          {busy ? `Preparing ${busy}…` : 'Download'} <span aria-hidden="true">▾</span>
        </button>
        {open ? (
          <div
            id={menuId}
            role="menu"
            aria-label={`Download revision ${revision}`}
            onKeyDown={onMenuKey}
            className="absolute right-0 z-20 mt-1 w-80 rounded-md border border-stone-300 bg-white p-1 shadow-lg"
          >
            <p className="px-2.5 py-1.5 text-xs text-stone-600" role="presentation">
              Revision {revision}
              {unsaved ? ' as saved (your unsaved changes are not in these files)' : ''}
            </p>
            {ITEMS.map((item, i) => (
              <button
                key={item.id}
                ref={(el) => {
                  itemRefs.current[i] = el;
                }}
                type="button"
                role="menuitem"
                tabIndex={-1}
                onClick={() => void download(item)}
                className="block w-full rounded px-2.5 py-1.5 text-left text-sm hover:bg-accent-50 focus-visible:bg-accent-50"
              >
                <span className="font-semibold text-stone-900">{item.label}</span>
                <span className="block text-xs text-stone-600">{item.detail}</span>
              </button>
            ))}
          </div>
        ) : null}
      </div>
      {outcome ? (
        <div
          role={outcome.kind === 'error' ? 'alert' : 'status'}
          className={`order-last flex basis-full items-start justify-between gap-3 rounded-md border px-3 py-2 text-xs ${outcome.kind === 'error' ? 'border-red-300 bg-red-50 text-red-800' : 'border-stone-300 bg-white text-stone-800'}`}
        >
          {outcome.kind === 'error' ? (
            <p>The file could not be made: {outcome.message}</p>
          ) : (
            <div>
              <p>Downloaded {outcome.filename}.</p>
              {outcome.cmyk ? <p className="mt-1 text-amber-900">{CMYK_NOTE}</p> : null}
              {outcome.notes.length > 0 ? (
                <ul className="mt-1 list-disc pl-4 text-amber-900" aria-label="Notes on the file">
                  {outcome.notes.map((n) => (
                    <li key={n}>{n}</li>
                  ))}
                </ul>
              ) : null}
            </div>
          )}
          <button
            type="button"
            className="shrink-0 text-accent-700 underline"
            onClick={() => setOutcome(null)}
          >
            Dismiss
          </button>
        </div>
      ) : null}
    </>
  );
}
