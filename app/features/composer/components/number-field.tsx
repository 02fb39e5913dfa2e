// A labelled number box with its unit beside it. What is typed is kept as typed; only numbers
// inside [min, max] (and whole numbers where asked) reach the spec, so a half-typed "0." or an
// out-of-range value never becomes a figure. Leaving the box shows the value in force.
import { useId, useState } from 'react';
import { cn } from '../../../utils/cn';

export interface NumberFieldProps {
  label: string;
  /** Read out before the label but not shown (e.g. "Term 2"), where the group already says it. */
  srPrefix?: string;
  value: number;
  onChange: (value: number) => void;
  min: number;
  max: number;
  step?: number;
  integer?: boolean;
  unit?: string;
  /** Shown under the box, and read out with it. */
  hint?: string;
  disabled?: boolean;
  /** Digits after the point when the value is shown (not when typed). */
  decimals?: number;
  className?: string;
}

export function formatNumber(value: number, decimals?: number): string {
  return decimals === undefined ? String(value) : String(Number(value.toFixed(decimals)));
}

export function NumberField({
  label,
  srPrefix,
  value,
  onChange,
  min,
  max,
  step = 1,
  integer = false,
  unit,
  hint,
  disabled,
  decimals,
  className,
}: NumberFieldProps) {
  const id = useId();
  // The typed text, and the value in force when it was typed: an undo elsewhere shows the new value.
  const [draft, setDraft] = useState<{ text: string; over: number } | null>(null);
  const text = draft && draft.over === value ? draft.text : formatNumber(value, decimals);
  const parsed = Number(text.replace(',', '.'));
  const problem =
    text.trim() === '' || !Number.isFinite(parsed)
      ? 'enter a number'
      : parsed < min || parsed > max
        ? `enter ${min} to ${max}`
        : integer && !Number.isInteger(parsed)
          ? 'enter a whole number'
          : null;
  const invalid = draft !== null && draft.over === value && problem !== null;
  const hintId = `${id}-hint`;
  const errorId = `${id}-error`;
  return (
    <div className={cn('space-y-1', className)}>
      <label htmlFor={id} className="block text-sm font-semibold text-stone-800">
        {srPrefix ? <span className="sr-only">{srPrefix} </span> : null}
        {label}
      </label>
      <div className="flex items-center gap-2">
        <input
          id={id}
          type="number"
          inputMode={integer ? 'numeric' : 'decimal'}
          min={min}
          max={max}
          step={step}
          value={text}
          disabled={disabled}
          aria-invalid={invalid || undefined}
          aria-describedby={
            [hint ? hintId : '', invalid ? errorId : ''].filter(Boolean).join(' ') || undefined
          }
          onChange={(e) => {
            const next = e.target.value;
            const v = Number(next.replace(',', '.'));
            const ok =
              next.trim() !== '' &&
              Number.isFinite(v) &&
              v >= min &&
              v <= max &&
              (!integer || Number.isInteger(v));
            setDraft({ text: next, over: ok ? v : value });
            if (ok && v !== value) onChange(v);
          }}
          onBlur={() => setDraft(null)}
          className={cn(
            'block w-full min-w-0 rounded-md border bg-white px-2.5 py-1.5 text-sm tabular-nums text-stone-900 shadow-xs',
            'disabled:bg-stone-100 disabled:text-stone-600',
            invalid ? 'border-red-600' : 'border-stone-300',
          )}
        />
        {unit ? <span className="shrink-0 text-sm text-stone-600">{unit}</span> : null}
      </div>
      {hint ? (
        <p id={hintId} className="text-xs text-stone-600">
          {hint}
        </p>
      ) : null}
      {invalid ? (
        <p id={errorId} className="text-xs text-red-700">
          {label}: {problem}; the figure keeps {formatNumber(value, decimals)}.
        </p>
      ) : null}
    </div>
  );
}
