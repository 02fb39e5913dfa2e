// Buttons in Lobewright's four weights; `buttonClasses` dresses a router Link the same way.
import type { ButtonHTMLAttributes } from 'react';
import { cn } from '../../utils/cn';

export type ButtonVariant = 'primary' | 'secondary' | 'danger' | 'quiet';

const variants: Record<ButtonVariant, string> = {
  primary: 'bg-accent-600 text-white hover:bg-accent-700 border border-accent-700 shadow-sm',
  secondary: 'bg-white text-stone-800 hover:bg-stone-100 border border-stone-300 shadow-sm',
  danger: 'bg-white text-red-700 hover:bg-red-50 border border-red-300 shadow-sm',
  quiet: 'bg-transparent text-accent-700 hover:bg-accent-50 border border-transparent',
};

export function buttonClasses(
  variant: ButtonVariant = 'secondary',
  size: 'sm' | 'md' = 'md',
): string {
  return cn(
    'inline-flex items-center justify-center gap-2 rounded-md font-semibold transition-colors',
    'disabled:cursor-not-allowed disabled:opacity-55',
    'aria-pressed:border-accent-600 aria-pressed:bg-accent-50 aria-pressed:text-accent-800',
    size === 'sm' ? 'px-2.5 py-1 text-sm' : 'px-4 py-2 text-sm',
    variants[variant],
  );
}

interface ButtonProps extends ButtonHTMLAttributes<HTMLButtonElement> {
  variant?: ButtonVariant;
  size?: 'sm' | 'md';
  /** Shows the action is under way and stops a second click; the label should say so too. */
  busy?: boolean;
}

export function Button({
  variant,
  size,
  busy = false,
  className,
  disabled,
  type = 'button',
  ...rest
}: ButtonProps) {
  return (
    <button
      type={type}
      className={cn(buttonClasses(variant, size), className)}
      disabled={disabled || busy}
      aria-busy={busy || undefined}
      {...rest}
    />
  );
}
