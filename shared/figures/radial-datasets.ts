/**
 * Uploaded data drawn in a radial plot beside the computed curves. Builders are pure and take only
 * the spec, so the caller resolves the spec's `kind.datasets` ids to their points first and passes
 * them as FigureDatasets; this module picks what to draw and turns points into drawn polylines.
 * Points arrive in atomic units (r in bohr; R in bohr^-3/2, r²R² in bohr^-1, V in hartree).
 */
import type { RadialDataQuantity } from '../data/radial-data-units';
import type { ResolvedFigureSpec } from '../spec/resolve-figure-spec';
import { clipPolyline } from './clip-polyline';
import type { Frame } from './plot-axes';
import { circleCommands, polylineCommands, type SceneNode, type Stroke } from './scene';

export interface RadialDataset {
  quantity: RadialDataQuantity;
  /** Radii in bohr, increasing. */
  r: readonly number[];
  /** Values in atomic units. */
  values: readonly number[];
  /** The data set's name, shown in the legend unless the spec gives a label. */
  label: string;
}

/** Data sets by id, as the figure's project holds them. */
export type FigureDatasets = Readonly<Record<number, RadialDataset>>;

export type DataPanelQuantity = 'R' | 'r2R2' | 'veff';

export interface DataSeries {
  id: number;
  label: string;
  panel: DataPanelQuantity;
  r: readonly number[];
  values: readonly number[];
}

const PANEL_OF: Record<RadialDataQuantity, DataPanelQuantity> = {
  R: 'R',
  r2R2: 'r2R2',
  potential: 'veff',
};
/** Up to this many points, each point is also marked, so sparse tables read as data, not as a curve. */
const MARKED_POINTS = 40;
const MARKER_RADIUS_MM = 0.45;

/** The data series a radial spec asks for; ids with no data become notes instead of failures. */
export function dataSeriesOf(
  spec: ResolvedFigureSpec,
  datasets: FigureDatasets | undefined,
): { series: DataSeries[]; notes: string[] } {
  const series: DataSeries[] = [];
  const notes: string[] = [];
  if (spec.kind.type !== 'radial') return { series, notes };
  for (const ref of spec.kind.datasets ?? []) {
    const d = datasets?.[ref.id];
    if (!d) {
      notes.push(`Data set ${ref.id} is not in this project, so it is not drawn.`);
      continue;
    }
    series.push({
      id: ref.id,
      label: ref.label || d.label,
      panel: PANEL_OF[d.quantity],
      r: d.r,
      values: d.values,
    });
  }
  return { series, notes };
}

/** Largest and smallest drawn value (printed units) of the series within r ≤ rMaxBohr. */
export function seriesRange(
  series: readonly DataSeries[],
  rMaxBohr: number,
  printed: (s: DataSeries, v: number) => number,
): { lo: number; hi: number } {
  let lo = Infinity;
  let hi = -Infinity;
  for (const s of series)
    s.r.forEach((r, i) => {
      if (r > rMaxBohr) return;
      const v = printed(s, s.values[i]);
      lo = Math.min(lo, v);
      hi = Math.max(hi, v);
    });
  return { lo, hi };
}

/** The series as a clipped polyline (with point marks when sparse); drawn points are added to `drawn`. */
export function dataSeriesNodes(
  s: DataSeries,
  X: (rBohr: number) => number,
  Y: (value: number) => number,
  frame: Frame,
  stroke: Stroke,
  drawn: [number, number][],
): SceneNode[] {
  const pts = s.r.map((r, i) => [X(r), Y(s.values[i])] as [number, number]);
  const nodes: SceneNode[] = [];
  for (const piece of clipPolyline(pts, {
    x0: frame.x0,
    y0: frame.y0 - 0.01,
    x1: frame.x1,
    y1: frame.y1 + 0.01,
  })) {
    nodes.push({ type: 'path', commands: polylineCommands(piece), stroke, role: 'data-curve' });
    drawn.push(...piece);
  }
  if (pts.length <= MARKED_POINTS) {
    for (const [x, y] of pts) {
      if (x < frame.x0 || x > frame.x1 || y < frame.y0 || y > frame.y1) continue;
      nodes.push({
        type: 'path',
        commands: circleCommands(x, y, MARKER_RADIUS_MM),
        stroke: { ...stroke, dashPt: undefined },
        fill: { colour: stroke.colour },
        role: 'data-point',
      });
    }
  }
  return nodes;
}
