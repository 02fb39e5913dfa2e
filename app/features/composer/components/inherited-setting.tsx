// One look or print setting that the house style supplies unless the figure sets its own: shows
// "from house style: …" with a button to set it here, or the control with a button to go back.
import type { ReactNode } from 'react';
import { Button } from '../../../components/ui/button';

interface InheritedSettingProps {
  name: string;
  /** The house style's value, as text. */
  houseValue: string;
  /** True when the figure sets its own value. */
  own: boolean;
  onOwn: () => void;
  onInherit: () => void;
  disabled?: boolean;
  children: ReactNode;
}

export function InheritedSetting({
  name,
  houseValue,
  own,
  onOwn,
  onInherit,
  disabled,
  children,
}: InheritedSettingProps) {
  if (!own)
    return (
      <div className="flex items-center justify-between gap-2 rounded-md border border-dashed border-stone-300 px-2.5 py-1.5">
        <p className="text-sm">
          <span className="font-semibold text-stone-800">{name}</span>
          <span className="block text-xs text-stone-600">From house style: {houseValue}</span>
        </p>
        {disabled ? null : (
          <Button
            size="sm"
            variant="quiet"
            onClick={onOwn}
            aria-label={`Set ${name.toLowerCase()} for this figure`}
          >
            Set here
          </Button>
        )}
      </div>
    );
  return (
    <div className="space-y-1 rounded-md border border-accent-200 bg-accent-50/40 p-2">
      {children}
      {disabled ? null : (
        <div className="flex items-center justify-between gap-2 text-xs text-stone-600">
          <span>House style: {houseValue}</span>
          <Button
            size="sm"
            variant="quiet"
            onClick={onInherit}
            aria-label={`Use the house style for ${name.toLowerCase()}`}
          >
            Use house style
          </Button>
        </div>
      )}
    </div>
  );
}
