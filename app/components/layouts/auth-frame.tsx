// The centred card that holds the sign-in and sign-up forms.
import type { ReactNode } from 'react';
import { Wordmark } from '../wordmark';

export function AuthFrame({
  title,
  children,
  footer,
}: {
  title: string;
  children: ReactNode;
  footer?: ReactNode;
}) {
  return (
    <main className="flex min-h-screen items-center justify-center px-4 py-12">
      <div className="w-full max-w-sm space-y-6">
        <div className="flex justify-center">
          <Wordmark />
        </div>
        <section
          aria-labelledby="auth-title"
          className="rounded-xl border border-stone-200 bg-white p-6 shadow-sm"
        >
          <h1 id="auth-title" className="mb-4 text-xl font-semibold">
            {title}
          </h1>
          {children}
        </section>
        {footer && <div className="text-center text-sm text-stone-700">{footer}</div>}
      </div>
    </main>
  );
}
