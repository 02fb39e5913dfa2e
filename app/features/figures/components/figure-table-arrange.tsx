// The figure table while an editor puts the figures in order and numbers them: drag a row, or move
// it with its buttons or Alt+↑/↓, edit numbers in place or number the whole list in sequence under
// a chapter prefix; nothing is sent until "Save order", which sends the whole list as one order.
import { useEffect, useRef, useState, type DragEvent, type KeyboardEvent } from 'react';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/form-field';
import { FormAlert } from '../../../components/ui/status';
import { isApiError } from '../../../lib/api-client';
import {
  apiFieldErrors,
  formErrorMessage,
  validateForm,
  type FieldErrors,
} from '../../../lib/form-errors';
import { figureOrderBody, type FigureSummary } from '../../../../shared/api/schemas';
import { cn } from '../../../utils/cn';
import { sentence } from '../../../utils/sentence';
import { useReorderFigures } from '../api/reorder-figures';
import {
  arrangementChanged,
  duplicateNumbers,
  moveItem,
  renumberSequentially,
  type ArrangedFigure,
} from '../utils/arrange-figures';
import { kindName } from '../utils/figure-kinds';
import { PrintFilesCell, StatusCell } from './figure-table-cells';

interface ArrangeProps {
  projectId: number;
  figures: FigureSummary[];
  onDone: (saved: boolean) => void;
}

const ARRANGE_COLUMNS = [
  ['Move', 'w-32'],
  ['Number', 'w-36'],
  ['Title', ''],
  ['Kind', ''],
  ['Status', ''],
  ['Print files', ''],
] as const;

/** The chapter part of the first number ("4" of "4.1"), as a starting prefix. */
function guessPrefix(figures: FigureSummary[]): string {
  const first = figures.find((f) => f.number)?.number ?? '';
  const dot = first.lastIndexOf('.');
  return dot > 0 ? first.slice(0, dot) : '';
}

export function FigureTableArrange({ projectId, figures, onDone }: ArrangeProps) {
  const saved: ArrangedFigure[] = figures.map(({ id, number }) => ({ id, number }));
  const [arranged, setArranged] = useState<ArrangedFigure[]>(saved);
  const [prefix, setPrefix] = useState(() => guessPrefix(figures));
  const [prefixError, setPrefixError] = useState<string | undefined>();
  const [errors, setErrors] = useState<FieldErrors>({});
  const [announcement, setAnnouncement] = useState('');
  const [dragging, setDragging] = useState<number | null>(null);
  // Which control to focus after a move: the row (Alt+arrows) or the button that was pressed.
  const [focusAfterMove, setFocusAfterMove] = useState<{
    id: number;
    control: 'row' | 'up' | 'down';
  } | null>(null);
  const rows = useRef(new Map<number, HTMLTableRowElement>());
  const reorder = useReorderFigures(projectId);

  const byId = new Map(figures.map((f) => [f.id, f]));
  const twice = duplicateNumbers(arranged);
  const changed = arrangementChanged(saved, arranged);
  const allErrors: FieldErrors = { ...apiFieldErrors(reorder.error), ...errors };
  const listChanged = isApiError(reorder.error, 'incomplete_order');

  // Moving a row moves its DOM node, which drops focus: put it back, so that Alt+↑ or the same
  // button can be pressed again and again.
  useEffect(() => {
    if (!focusAfterMove) return;
    const row = rows.current.get(focusAfterMove.id);
    const button =
      focusAfterMove.control === 'row'
        ? null
        : row?.querySelector<HTMLButtonElement>(`[data-move="${focusAfterMove.control}"]`);
    if (button && !button.disabled) button.focus();
    else row?.focus();
  }, [focusAfterMove]);

  function move(from: number, to: number, focus: 'row' | 'up' | 'down' | null) {
    if (to < 0 || to >= arranged.length || from === to) return;
    const next = moveItem(arranged, from, to);
    const figure = byId.get(arranged[from].id);
    setArranged(next);
    setErrors({});
    if (focus) setFocusAfterMove({ id: arranged[from].id, control: focus });
    if (figure) setAnnouncement(`${figure.title} moved to position ${to + 1} of ${next.length}.`);
  }

  function setNumber(index: number, number: string) {
    setArranged((list) => list.map((f, i) => (i === index ? { ...f, number } : f)));
    setErrors({});
  }

  function renumber() {
    try {
      setArranged(renumberSequentially(arranged, prefix));
      setPrefixError(undefined);
      setErrors({});
      setAnnouncement(`Numbered ${arranged.length} figures in list order.`);
    } catch (err) {
      setPrefixError((err as Error).message.replace(/^prefix: /, ''));
    }
  }

  function save() {
    const checked = validateForm(figureOrderBody, { figures: arranged });
    if (!checked.ok) {
      setErrors(checked.fields);
      return;
    }
    reorder.mutate(checked.data, { onSuccess: () => onDone(true) });
  }

  function onRowKeyDown(event: KeyboardEvent<HTMLTableRowElement>, index: number) {
    if (!event.altKey || (event.key !== 'ArrowUp' && event.key !== 'ArrowDown')) return;
    event.preventDefault();
    move(index, event.key === 'ArrowUp' ? index - 1 : index + 1, 'row');
  }

  function onDragOver(event: DragEvent<HTMLTableRowElement>, index: number) {
    if (dragging === null) return;
    event.preventDefault();
    const from = arranged.findIndex((f) => f.id === dragging);
    if (from !== index) move(from, index, null);
  }

  const stem = prefix.trim().replace(/\.+$/, '');
  const helperLabel = stem ? `Renumber ${stem}.1, ${stem}.2, …` : 'Renumber 1, 2, …';

  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-end gap-3 rounded-lg border border-stone-200 bg-white p-4">
        <TextField
          label="Chapter prefix"
          value={prefix}
          onChange={(e) => setPrefix(e.target.value)}
          error={prefixError}
          hint="Numbers the list in its current order."
          className="w-64"
        />
        <Button onClick={renumber} className="mb-5">
          {helperLabel}
        </Button>
        <p className="mb-5 max-w-md text-sm text-stone-600">
          Drag a row by its handle, or focus a row and press Alt+↑ or Alt+↓. Numbers can be edited
          in place.
        </p>
      </div>

      {listChanged ? (
        <div
          role="alert"
          className="flex flex-wrap items-center gap-3 rounded-md border border-amber-300 bg-amber-50 px-3 py-2 text-sm text-amber-950"
        >
          Someone added or removed a figure meanwhile, so this order no longer covers the whole
          list.
          <Button
            size="sm"
            onClick={() => {
              setArranged(figures.map(({ id, number }) => ({ id, number })));
              reorder.reset();
            }}
          >
            Start again from the current list
          </Button>
        </div>
      ) : (
        <>
          <FormAlert message={formErrorMessage(reorder.error, Object.keys(allErrors))} />
          {allErrors.figures && <FormAlert message={allErrors.figures} />}
        </>
      )}
      <p role="status" className="sr-only">
        {announcement}
      </p>

      <div className="overflow-x-auto rounded-xl border border-stone-200 bg-white">
        <table className="w-full min-w-[52rem] border-collapse text-sm">
          <caption className="sr-only">
            Figures in list order; move rows and edit numbers, then save the order
          </caption>
          <thead className="border-b border-stone-200 bg-stone-50 text-left text-stone-700">
            <tr>
              {ARRANGE_COLUMNS.map(([label, width]) => (
                <th key={label} scope="col" className={cn('px-3 py-2 font-semibold', width)}>
                  {label}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {arranged.map((item, index) => {
              const figure = byId.get(item.id);
              if (!figure) return null;
              const numberError =
                allErrors[`figures.${index}.number`] ??
                (twice.has(item.number.trim()) ? 'used twice' : undefined);
              const errorId = `arrange-number-error-${item.id}`;
              return (
                <tr
                  key={item.id}
                  ref={(el) => {
                    if (el) rows.current.set(item.id, el);
                    else rows.current.delete(item.id);
                  }}
                  tabIndex={-1}
                  aria-label={`${figure.title}, position ${index + 1} of ${arranged.length}`}
                  draggable
                  onDragStart={(e) => {
                    setDragging(item.id);
                    e.dataTransfer.effectAllowed = 'move';
                    e.dataTransfer.setData('text/plain', String(item.id));
                  }}
                  onDragOver={(e) => onDragOver(e, index)}
                  onDrop={(e) => e.preventDefault()}
                  onDragEnd={() => setDragging(null)}
                  onKeyDown={(e) => onRowKeyDown(e, index)}
                  className={cn(
                    'border-b border-stone-100 last:border-0 focus-within:bg-accent-50 focus:outline-2 focus:outline-accent-600',
                    dragging === item.id && 'bg-accent-100 opacity-70',
                  )}
                >
                  <td className="px-3 py-1.5">
                    <div className="flex items-center gap-1">
                      <span
                        aria-hidden="true"
                        title="Drag to move"
                        className="cursor-grab select-none px-1 text-lg leading-none text-stone-400"
                      >
                        ⠿
                      </span>
                      <Button
                        size="sm"
                        variant="quiet"
                        aria-label={`Move ${figure.title} up`}
                        data-move="up"
                        disabled={index === 0}
                        onClick={() => move(index, index - 1, 'up')}
                      >
                        ↑
                      </Button>
                      <Button
                        size="sm"
                        variant="quiet"
                        aria-label={`Move ${figure.title} down`}
                        data-move="down"
                        disabled={index === arranged.length - 1}
                        onClick={() => move(index, index + 1, 'down')}
                      >
                        ↓
                      </Button>
                    </div>
                  </td>
                  <td className="px-3 py-1.5">
                    <input
                      aria-label={`Number of ${figure.title}`}
                      value={item.number}
                      onChange={(e) => setNumber(index, e.target.value)}
                      aria-invalid={numberError ? true : undefined}
                      aria-describedby={numberError ? errorId : undefined}
                      className={cn(
                        'w-24 rounded-md border bg-white px-2 py-1 text-sm tabular-nums',
                        numberError ? 'border-red-600' : 'border-stone-300',
                      )}
                    />
                    {numberError && (
                      <p id={errorId} className="mt-1 text-xs text-red-700">
                        {sentence(numberError)}
                      </p>
                    )}
                  </td>
                  <th scope="row" className="px-3 py-1.5 text-left font-semibold">
                    {figure.title}
                  </th>
                  <td className="px-3 py-1.5 text-stone-700">{kindName(figure.kind)}</td>
                  <StatusCell figure={figure} />
                  <PrintFilesCell figure={figure} />
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>

      <div className="flex flex-wrap items-center justify-end gap-2">
        <Button onClick={() => onDone(false)}>{changed ? 'Discard changes' : 'Done'}</Button>
        <Button
          variant="primary"
          disabled={!changed || twice.size > 0}
          busy={reorder.isPending}
          onClick={save}
        >
          {reorder.isPending ? 'Saving order…' : 'Save order'}
        </Button>
      </div>
    </div>
  );
}
