// A labelled drop-down over a fixed list of values: only listed values can be chosen.
import { useId } from 'react';
import { cn } from '../../../utils/cn';

export interface Choice<T extends string | number> {
  value: T;
  label: string;
}

interface ChoiceFieldProps<T extends string | number> {
  label: string;
  /** Read out before the label but not shown (e.g. "Term 2"), where the group already says it. */
  srPrefix?: string;
  value: T;
  choices: readonly Choice<T>[];
  onChange: (value: T) => void;
  disabled?: boolean;
  hint?: string;
  className?: string;
}

export function ChoiceField<T extends string | number>({
  label,
  srPrefix,
  value,
  choices,
  onChange,
  disabled,
  hint,
  className,
}: ChoiceFieldProps<T>) {
  const id = useId();
  return (
    <div className={cn('space-y-1', className)}>
      <label htmlFor={id} className="block text-sm font-semibold text-stone-800">
        {srPrefix ? <span className="sr-only">{srPrefix} </span> : null}
        {label}
      </label>
      <select
        id={id}
        value={String(value)}
        disabled={disabled}
        aria-describedby={hint ? `${id}-hint` : undefined}
        onChange={(e) => {
          const chosen = choices.find((c) => String(c.value) === e.target.value);
          if (chosen) onChange(chosen.value);
        }}
        className="block w-full rounded-md border border-stone-300 bg-white px-2.5 py-1.5 text-sm text-stone-900 shadow-xs disabled:bg-stone-100 disabled:text-stone-600"
      >
        {choices.map((c) => (
          <option key={String(c.value)} value={String(c.value)}>
            {c.label}
          </option>
        ))}
      </select>
      {hint ? (
        <p id={`${id}-hint`} className="text-xs text-stone-600">
          {hint}
        </p>
      ) : null}
    </div>
  );
}
