/**
 * A legend: one row per curve, a short sample of its line and its label, set in a corner of the
 * plot frame without a box (the calm look of Lobewright's plots).
 */
import type { Frame } from './plot-axes';
import { text } from './plot-axes';
import { lineNode, ptToMm, type SceneNode, type Stroke, type TextRun } from './scene';
import type { Box } from './text-layout';
import { layoutRuns } from './text-layout';
import { FONT_METRICS } from './font-metrics';

export interface LegendEntry {
  runs: TextRun[];
  stroke: Stroke;
}

const SAMPLE_MM = 5.5;
const GAP_MM = 1.2;
const INSET_MM = 1.5;

export interface Legend {
  nodes: SceneNode[];
  box: Box;
}

/** Legend in the top-right (or top-left) corner of the frame. */
export function legend(
  entries: readonly LegendEntry[],
  frame: Frame,
  sizePt: number,
  colour: string,
  corner: 'top-right' | 'top-left' = 'top-right',
): Legend {
  const m = FONT_METRICS.regular;
  const rowHeight = ptToMm(sizePt) * 1.35;
  const cap = ptToMm((m.capHeight / m.unitsPerEm) * sizePt);
  const width =
    SAMPLE_MM +
    GAP_MM +
    Math.max(0, ...entries.map((e) => layoutRuns(e.runs, sizePt, 'start').widthMm));
  const x0 = corner === 'top-right' ? frame.x1 - INSET_MM - width : frame.x0 + INSET_MM + 2;
  const y0 = frame.y0 + INSET_MM;
  const nodes: SceneNode[] = [];
  entries.forEach((e, i) => {
    const baseline = y0 + cap + i * rowHeight;
    const mid = baseline - cap / 2;
    nodes.push(lineNode(x0, mid, x0 + SAMPLE_MM, mid, e.stroke, 'legend-sample'));
    nodes.push(
      text(x0 + SAMPLE_MM + GAP_MM, baseline, e.runs, sizePt, 'start', colour, 'legend-label'),
    );
  });
  const height = cap + (entries.length - 1) * rowHeight + ptToMm(sizePt) * 0.3;
  return {
    nodes,
    box: { x0: x0 - 0.5, y0: y0 - 0.5, x1: x0 + width + 0.5, y1: y0 + height + 0.5 },
  };
}

/** The top corner whose legend covers fewest curve points (top-right on a tie). */
export function legendAvoiding(
  entries: readonly LegendEntry[],
  frame: Frame,
  sizePt: number,
  colour: string,
  points: readonly (readonly [number, number])[],
): Legend {
  const right = legend(entries, frame, sizePt, colour, 'top-right');
  const left = legend(entries, frame, sizePt, colour, 'top-left');
  const m = 1.5; // curves just outside the legend crowd it too
  const covered = (b: Box): number =>
    points.filter(([x, y]) => x >= b.x0 - m && x <= b.x1 + m && y >= b.y0 - m && y <= b.y1 + m)
      .length;
  return covered(left.box) < covered(right.box) ? left : right;
}
