// Print sizes: the pixel size a width in mm comes out at for a dpi (as the render route makes it:
// round(mm / 25.4 × dpi)), and the common page widths offered as presets.
import { COLUMN_WIDTHS_MM } from '../../../../shared/spec/house-style';

export const MM_PER_INCH = 25.4;

export function pixelsFor(mm: number, dpi: number): number {
  return Math.round((mm / MM_PER_INCH) * dpi);
}

export interface SizePreset {
  name: string;
  widthMm: number;
  heightMm: number;
}

/**
 * Single column ≈ 84 mm and double column ≈ 174 mm (common practice in journal and textbook
 * production); a 16:9 slide at 254 mm wide.
 */
export const SIZE_PRESETS: readonly SizePreset[] = [
  { name: 'Single column', widthMm: COLUMN_WIDTHS_MM.single, heightMm: COLUMN_WIDTHS_MM.single },
  { name: 'Double column', widthMm: COLUMN_WIDTHS_MM.double, heightMm: 116 },
  {
    name: 'Slide',
    widthMm: COLUMN_WIDTHS_MM.slide,
    heightMm: Math.round((COLUMN_WIDTHS_MM.slide * 9) / 16),
  },
];

/** Common resolutions: 300 dpi for halftones, 600 for line art (common practice), 150 for screens. */
export const DPI_CHOICES = [150, 300, 600, 1200] as const;
