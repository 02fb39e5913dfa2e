// A labelled box for a short list of numbers ("50, 90"). Only a list that parses and lies inside
// the limits reaches the spec; otherwise the field says what is wrong and the figure keeps its list.
import { useId, useState } from 'react';
import { cn } from '../../../utils/cn';

interface ListFieldProps {
  label: string;
  values: readonly number[];
  onChange: (values: number[]) => void;
  /** Turns a typed number into the stored one (e.g. % → fraction), or an error text. */
  parse: (typed: number) => number | string;
  show: (stored: number) => string;
  maxItems: number;
  unit?: string;
  hint?: string;
  disabled?: boolean;
}

export function ListField({
  label,
  values,
  onChange,
  parse,
  show,
  maxItems,
  unit,
  hint,
  disabled,
}: ListFieldProps) {
  const id = useId();
  const current = values.map(show).join(', ');
  const [draft, setDraft] = useState<{ text: string; over: string } | null>(null);
  const text = draft && draft.over === current ? draft.text : current;

  function check(typed: string): number[] | string {
    const parts = typed.split(/[,;\s]+/).filter(Boolean);
    if (parts.length > maxItems) return `at most ${maxItems} values`;
    const out: number[] = [];
    for (const p of parts) {
      const v = Number(p);
      if (!Number.isFinite(v)) return `"${p}" is not a number`;
      const stored = parse(v);
      if (typeof stored === 'string') return stored;
      out.push(stored);
    }
    return out;
  }
  const result = check(text);
  const problem = typeof result === 'string' ? result : null;
  return (
    <div className="space-y-1">
      <label htmlFor={id} className="block text-sm font-semibold text-stone-800">
        {label}
        {unit ? <span className="font-normal text-stone-600"> ({unit})</span> : null}
      </label>
      <input
        id={id}
        type="text"
        value={text}
        disabled={disabled}
        aria-invalid={problem ? true : undefined}
        aria-describedby={`${id}-hint`}
        onChange={(e) => {
          const next = check(e.target.value);
          const nextText = typeof next === 'string' ? current : next.map(show).join(', ');
          setDraft({ text: e.target.value, over: nextText });
          if (typeof next !== 'string' && nextText !== current) onChange(next);
        }}
        onBlur={() => setDraft(null)}
        className={cn(
          'block w-full rounded-md border bg-white px-2.5 py-1.5 text-sm tabular-nums shadow-xs disabled:bg-stone-100',
          problem ? 'border-red-600' : 'border-stone-300',
        )}
      />
      <p id={`${id}-hint`} className={cn('text-xs', problem ? 'text-red-700' : 'text-stone-600')}>
        {problem ? `${label}: ${problem}; the figure keeps ${current || 'none'}.` : hint}
      </p>
    </div>
  );
}
