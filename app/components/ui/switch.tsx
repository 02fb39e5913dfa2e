// An on/off control announced as a switch; Space toggles it like any button.
import { useId } from 'react';
import { cn } from '../../utils/cn';

interface SwitchProps {
  label: string;
  checked: boolean;
  onChange: (checked: boolean) => void;
  disabled?: boolean;
  hint?: string;
}

export function Switch({ label, checked, onChange, disabled, hint }: SwitchProps) {
  const id = useId();
  return (
    <div className="flex items-start gap-3">
      <button
        id={id}
        type="button"
        role="switch"
        aria-checked={checked}
        aria-describedby={hint ? `${id}-hint` : undefined}
        disabled={disabled}
        onClick={() => onChange(!checked)}
        className={cn(
          'relative mt-0.5 inline-flex h-6 w-11 shrink-0 items-center rounded-full border transition-colors disabled:opacity-55',
          checked ? 'border-accent-700 bg-accent-600' : 'border-stone-400 bg-stone-200',
        )}
      >
        <span
          aria-hidden="true"
          className={cn(
            'inline-block size-4 rounded-full bg-white shadow transition-transform',
            checked ? 'translate-x-6' : 'translate-x-1',
          )}
        />
      </button>
      <div>
        <label htmlFor={id} className="text-sm font-semibold text-stone-800">
          {label}
        </label>
        {hint && (
          <p id={`${id}-hint`} className="text-xs text-stone-600">
            {hint}
          </p>
        )}
      </div>
    </div>
  );
}
