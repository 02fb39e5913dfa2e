// Preset directions for the 3D view (see camera-pose.ts for the angle conventions).
import type { ViewSettings } from './camera-pose';

export type ViewPresetName = 'along-x' | 'along-y' | 'along-z' | 'three-quarter';

export const VIEW_PRESETS: Record<
  ViewPresetName,
  { label: string; azimuthDeg: number; elevationDeg: number }
> = {
  'along-x': { label: 'Along x', azimuthDeg: 0, elevationDeg: 0 },
  'along-y': { label: 'Along y', azimuthDeg: -90, elevationDeg: 0 },
  'along-z': { label: 'Along z', azimuthDeg: -90, elevationDeg: 90 },
  'three-quarter': { label: 'Three-quarter', azimuthDeg: 35, elevationDeg: 20 },
};

export function presetView(name: ViewPresetName, current: ViewSettings): ViewSettings {
  const preset = VIEW_PRESETS[name];
  return { ...current, azimuthDeg: preset.azimuthDeg, elevationDeg: preset.elevationDeg, zoom: 1 };
}
