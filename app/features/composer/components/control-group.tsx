// A titled group of composer controls (a fieldset, so the legend names every control inside).
import type { ReactNode } from 'react';

export function ControlGroup({
  legend,
  children,
  note,
}: {
  legend: string;
  children: ReactNode;
  note?: ReactNode;
}) {
  return (
    <fieldset className="space-y-3 border-t border-stone-200 pt-3 first:border-t-0 first:pt-0">
      <legend className="float-left mb-2 w-full text-xs font-semibold tracking-wide text-stone-600 uppercase">
        {legend}
      </legend>
      {note ? <p className="clear-both text-xs text-stone-600">{note}</p> : null}
      <div className="clear-both space-y-3">{children}</div>
    </fieldset>
  );
}
