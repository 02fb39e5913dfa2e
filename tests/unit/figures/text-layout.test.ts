// Text is measured from the committed metrics: they must equal what fontkit reads from the shipped
// fonts (the same engine pdfkit embeds with), and sub/superscripts must shrink and shift.
import { createRequire } from 'node:module';
import { describe, expect, it } from 'vitest';
import { FONT_METRICS } from '../../../shared/figures/font-metrics';
import { ptToMm } from '../../../shared/figures/scene';
import { layoutRuns, SCRIPT_SCALE, stringWidthMm } from '../../../shared/figures/text-layout';

interface Font {
  unitsPerEm: number;
  layout(text: string, features: Record<string, boolean>): { advanceWidth: number };
}
const fontkit = createRequire(import.meta.url)('fontkit') as { openSync(p: string): Font };

describe('font metrics and text layout', () => {
  it('when measuring labels, then widths equal fontkit layout of the shipped Inter with kerning off', () => {
    const faces = ['regular', 'italic', 'semibold', 'semibold-italic'] as const;
    for (const face of faces) {
      const font = fontkit.openSync(`assets/fonts/inter-${face}.otf`);
      for (const text of [
        '3d',
        'r / bohr',
        'ψ / bohr−3/2',
        'Hα 656.47 nm',
        'AVAWTo 0123456789',
        'Å × 10³ · θφ',
      ]) {
        const expected = ptToMm(
          (font.layout(text, { kern: false, liga: false, calt: false }).advanceWidth /
            font.unitsPerEm) *
            8,
        );
        expect(stringWidthMm(text, face, 8), `${face} "${text}"`).toBeCloseTo(expected, 9);
      }
      expect(FONT_METRICS[face].unitsPerEm).toBe(font.unitsPerEm);
    }
  });

  it('when a run is a subscript, then it is set smaller and below the baseline; a superscript above', () => {
    const layout = layoutRuns(
      [
        { text: 'r', shift: 'base', italic: true },
        { text: 'mp', shift: 'sub' },
        { text: '2', shift: 'sup' },
      ],
      10,
      'start',
    );
    expect(layout.runs[0].face).toBe('italic');
    expect(layout.runs[1].sizePt).toBeCloseTo(10 * SCRIPT_SCALE, 12);
    expect(layout.runs[1].dy).toBeGreaterThan(0);
    expect(layout.runs[2].dy).toBeLessThan(0);
    expect(layout.runs[1].dx).toBeCloseTo(layout.runs[0].widthMm, 12);
  });

  it('when anchored in the middle or at the end, then the runs are shifted by half or all of the width', () => {
    const runs = [{ text: '2p', shift: 'base' as const }];
    const start = layoutRuns(runs, 8, 'start');
    expect(layoutRuns(runs, 8, 'middle').runs[0].dx).toBeCloseTo(-start.widthMm / 2, 12);
    expect(layoutRuns(runs, 8, 'end').runs[0].dx).toBeCloseTo(-start.widthMm, 12);
  });
});
