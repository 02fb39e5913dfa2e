// A small group of mutually exclusive options shown side by side (radio buttons underneath).
import { useId } from 'react';
import { cn } from '../../utils/cn';

interface SegmentedChoiceProps<T extends string> {
  legend: string;
  options: ReadonlyArray<{ value: T; label: string }>;
  value: T;
  onChange: (value: T) => void;
}

export function SegmentedChoice<T extends string>({
  legend,
  options,
  value,
  onChange,
}: SegmentedChoiceProps<T>) {
  const name = useId();
  return (
    <fieldset className="inline-flex items-center gap-3">
      <legend className="sr-only">{legend}</legend>
      <div className="inline-flex rounded-md border border-stone-300 bg-white p-0.5 shadow-xs">
        {options.map((option) => (
          <label
            key={option.value}
            className={cn(
              'cursor-pointer rounded px-3 py-1 text-sm font-semibold has-[:focus-visible]:outline-2 has-[:focus-visible]:outline-accent-600',
              option.value === value
                ? 'bg-accent-600 text-white'
                : 'text-stone-700 hover:bg-stone-100',
            )}
          >
            <input
              type="radio"
              name={name}
              value={option.value}
              checked={option.value === value}
              onChange={() => onChange(option.value)}
              className="sr-only"
            />
            {option.label}
          </label>
        ))}
      </div>
    </fieldset>
  );
}
