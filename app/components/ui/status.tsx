// What a page shows while data loads or after it failed: a polite status and an alert with a retry.
import type { ReactNode } from 'react';
import { Link } from 'react-router';
import { ApiError } from '../../lib/api-client';
import { sentence } from '../../utils/sentence';
import { Button, buttonClasses } from './button';

export function Loading({ label = 'Loading…' }: { label?: string }) {
  return (
    <div role="status" className="flex items-center gap-3 py-8 text-sm text-stone-600">
      <span
        aria-hidden="true"
        className="size-4 animate-spin rounded-full border-2 border-stone-300 border-t-accent-600"
      />
      {label}
    </div>
  );
}

function describe(error: unknown): { title: string; message: string } {
  if (error instanceof ApiError) {
    if (error.status === 404) return { title: 'Not found', message: error.message };
    if (error.status === 403) return { title: 'Not allowed', message: error.message };
    if (error.status === 0) return { title: 'Offline', message: error.message };
    return { title: 'Could not load this', message: error.message };
  }
  return {
    title: 'Something went wrong',
    message: error instanceof Error ? error.message : String(error),
  };
}

export function ErrorPanel({
  error,
  onRetry,
  children,
}: {
  error: unknown;
  onRetry?: () => void;
  children?: ReactNode;
}) {
  const { title, message } = describe(error);
  const clientError = error instanceof ApiError && error.status >= 400 && error.status < 500;
  return (
    <div
      role="alert"
      className="space-y-3 rounded-lg border border-red-200 bg-red-50 p-4 text-sm text-red-900"
    >
      <p className="font-semibold">{title}</p>
      <p>{sentence(message)}</p>
      {children}
      {/* Asking again cannot help when the server said no (4xx); going back to the start can. */}
      {clientError ? (
        <Link to="/" className={buttonClasses('secondary', 'sm')}>
          Go to your projects
        </Link>
      ) : (
        onRetry && (
          <Button size="sm" onClick={onRetry}>
            Try again
          </Button>
        )
      )}
    </div>
  );
}

/** A form-level problem (not tied to one field). */
export function FormAlert({ message }: { message: string | null }) {
  if (!message) return null;
  return (
    <p
      role="alert"
      className="rounded-md border border-red-200 bg-red-50 px-3 py-2 text-sm text-red-800"
    >
      {sentence(message)}
    </p>
  );
}

/** Confirms that something was saved; announced politely. */
export function SavedNote({ children }: { children: ReactNode }) {
  return (
    <p role="status" className="text-sm text-emerald-800">
      {children}
    </p>
  );
}
