// Tabs over the composer's control groups: arrow keys move between tabs, the panel follows.
import { useId, useRef, type ReactNode } from 'react';
import { cn } from '../../../utils/cn';

export interface Tab {
  id: string;
  label: string;
  content: ReactNode;
}

export function ControlTabs({
  tabs,
  selected,
  onSelect,
}: {
  tabs: readonly Tab[];
  selected: string;
  onSelect: (id: string) => void;
}) {
  const base = useId();
  const refs = useRef<(HTMLButtonElement | null)[]>([]);
  const index = Math.max(
    0,
    tabs.findIndex((t) => t.id === selected),
  );
  const move = (i: number) => {
    const next = (i + tabs.length) % tabs.length;
    onSelect(tabs[next].id);
    refs.current[next]?.focus();
  };
  return (
    <div>
      <div
        role="tablist"
        aria-label="Composer controls"
        className="flex flex-wrap gap-0.5 border-b border-stone-200"
      >
        {tabs.map((t, i) => (
          <button
            key={t.id}
            ref={(el) => {
              refs.current[i] = el;
            }}
            type="button"
            role="tab"
            id={`${base}-tab-${t.id}`}
            aria-selected={i === index}
            aria-controls={`${base}-panel-${t.id}`}
            tabIndex={i === index ? 0 : -1}
            onClick={() => onSelect(t.id)}
            onKeyDown={(e) => {
              if (e.key === 'ArrowRight') move(i + 1);
              else if (e.key === 'ArrowLeft') move(i - 1);
              else if (e.key === 'Home') move(0);
              else if (e.key === 'End') move(tabs.length - 1);
              else return;
              e.preventDefault();
            }}
            className={cn(
              '-mb-px rounded-t-md border border-b-0 px-2.5 py-1.5 text-sm font-semibold',
              i === index
                ? 'border-stone-200 bg-white text-accent-800'
                : 'border-transparent text-stone-600 hover:text-stone-900',
            )}
          >
            {t.label}
          </button>
        ))}
      </div>
      <div
        role="tabpanel"
        id={`${base}-panel-${tabs[index].id}`}
        aria-labelledby={`${base}-tab-${tabs[index].id}`}
        tabIndex={0}
        className="pt-4"
      >
        {tabs[index].content}
      </div>
    </div>
  );
}
