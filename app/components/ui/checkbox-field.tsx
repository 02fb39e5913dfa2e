// A checkbox with its label beside it; the whole label is the click target.
import type { InputHTMLAttributes, ReactNode } from 'react';

interface CheckboxFieldProps extends Omit<InputHTMLAttributes<HTMLInputElement>, 'type'> {
  label: ReactNode;
}

export function CheckboxField({ label, className, ...input }: CheckboxFieldProps) {
  return (
    <label className={`flex items-center gap-2 text-sm text-stone-800 ${className ?? ''}`}>
      <input type="checkbox" className="size-4 accent-accent-600" {...input} />
      {label}
    </label>
  );
}
