// Buttons that turn the 3D view to look along an axis or from three-quarters.
import { VIEW_PRESETS, type ViewPresetName } from '../utils/view-presets';

export function ViewPresetButtons({ onChoose }: { onChoose: (name: ViewPresetName) => void }) {
  return (
    <div role="group" aria-label="Preset views" className="flex flex-wrap gap-1">
      {(Object.keys(VIEW_PRESETS) as ViewPresetName[]).map((name) => (
        <button
          key={name}
          type="button"
          onClick={() => onChoose(name)}
          className="rounded border border-slate-300 bg-white px-2 py-0.5 text-xs text-slate-700 hover:bg-slate-50 focus-visible:outline-2 focus-visible:outline-slate-600"
        >
          {VIEW_PRESETS[name].label}
        </button>
      ))}
    </div>
  );
}
