// The heading block at the top of each page: title, optional context line and actions.
import type { ReactNode } from 'react';

interface PageHeaderProps {
  title: ReactNode;
  context?: ReactNode;
  actions?: ReactNode;
  children?: ReactNode;
}

export function PageHeader({ title, context, actions, children }: PageHeaderProps) {
  return (
    <header className="mb-6 space-y-2">
      {context && <div className="text-sm text-stone-600">{context}</div>}
      <div className="flex flex-wrap items-start justify-between gap-4">
        <h1 className="text-2xl font-semibold tracking-tight text-stone-900">{title}</h1>
        {actions && <div className="flex flex-wrap gap-2">{actions}</div>}
      </div>
      {children}
    </header>
  );
}
