// Which look and print settings a figure sets itself instead of taking them from the house style,
// and the spec with those cleared ("apply house style").
import type { FigureSpec } from '../../../../shared/spec/figure-spec';
import type { HouseStyle } from '../../../../shared/spec/house-style';

export type OverrideSection = 'look' | 'print';

export interface HouseStyleOverride {
  section: OverrideSection;
  field: string;
  /** The figure's own value and the house style's, as short text. */
  figureValue: string;
  houseValue: string;
}

export const SETTING_NAMES: Record<string, string> = {
  positiveColour: 'Positive phase colour',
  negativeColour: 'Negative phase colour',
  opacity: 'Opacity',
  showAxes: 'Axes',
  showScaleBar: 'Scale bar',
  showNodalSurfaces: 'Nodal surfaces',
  showLabel: 'Label',
  label: 'Label text',
  fontFamily: 'Font',
  fontSizePt: 'Font size',
  lineWidthPt: 'Line width',
  widthMm: 'Width',
  heightMm: 'Height',
  dpi: 'Resolution',
  background: 'Background',
  formats: 'Formats',
};

const UNITS: Record<string, string> = {
  fontSizePt: ' pt',
  lineWidthPt: ' pt',
  widthMm: ' mm',
  heightMm: ' mm',
  dpi: ' dpi',
};

export function describeSetting(field: string, value: unknown): string {
  if (typeof value === 'boolean') return value ? 'shown' : 'hidden';
  if (Array.isArray(value)) return value.map((v) => String(v).toUpperCase()).join(', ');
  if (field === 'opacity' && typeof value === 'number') return `${Math.round(value * 100)} %`;
  if (field === 'label' && value === '') return 'orbital name';
  return `${String(value)}${UNITS[field] ?? ''}`;
}

export function houseStyleOverrides(spec: FigureSpec, style: HouseStyle): HouseStyleOverride[] {
  const out: HouseStyleOverride[] = [];
  for (const section of ['look', 'print'] as const) {
    const own = spec[section] as Record<string, unknown>;
    const house = style[section] as Record<string, unknown>;
    for (const [field, value] of Object.entries(own)) {
      if (value === undefined) continue;
      out.push({
        section,
        field,
        figureValue: describeSetting(field, value),
        houseValue: describeSetting(field, house[field]),
      });
    }
  }
  return out;
}

/** The spec drawn wholly in the house style: its own look and print settings cleared. */
export function applyHouseStyle(spec: FigureSpec): FigureSpec {
  return { ...spec, look: {}, print: {} };
}
