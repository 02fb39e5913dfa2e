/**
 * Sizes and colours every 2D figure shares, derived from the resolved look: one calm style of
 * Lobewright's own (dark grey ink, thin axes, outward ticks, no frame box, no grid).
 */
import type { ResolvedFigureSpec } from '../spec/resolve-figure-spec';

export interface FigureStyle {
  fontSizePt: number;
  /** Tick labels, annotations and legends. */
  smallSizePt: number;
  lineWidthPt: number;
  axisWidthPt: number;
  tickLengthMm: number;
  ink: string;
  muted: string;
  faint: string;
  positive: string;
  negative: string;
  /** Colours and dash patterns for overlaid curves, in order. */
  curveColours: string[];
  curveDashes: (number[] | undefined)[];
}

export function figureStyle(spec: ResolvedFigureSpec): FigureStyle {
  const { look } = spec;
  const fontSizePt = look.fontSizePt;
  return {
    fontSizePt,
    smallSizePt: Math.max(5, fontSizePt * 0.85),
    lineWidthPt: look.lineWidthPt,
    axisWidthPt: Math.max(0.25, look.lineWidthPt * 0.7),
    tickLengthMm: 1.1,
    ink: '#262626',
    muted: '#6f6f6f',
    faint: '#b8b8b8',
    positive: look.positiveColour,
    negative: look.negativeColour,
    curveColours: [
      look.positiveColour,
      look.negativeColour,
      '#4b4fa6',
      '#8a6d1f',
      '#6f6f6f',
      '#a23b72',
    ],
    curveDashes: [undefined, [4, 1.6], [1.2, 1.4], [4, 1.4, 1.2, 1.4], [2.4, 1.4], [6, 2]],
  };
}
