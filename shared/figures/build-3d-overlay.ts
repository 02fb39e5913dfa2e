/**
 * The vector overlay printed on top of a 3D raster (isosurface, cloud, angular surface): the orbital
 * label, a scale bar in the figure's length unit, and the axis names at the ends of the axes the 3D
 * renderer draws. The renderer supplies the projection (physics-frame points in bohr → page mm),
 * so every label lands where the raster puts its object.
 */
import type { ResolvedFigureSpec } from '../spec/resolve-figure-spec';
import { figureStyle } from './figure-style';
import { stateLabelRuns } from './label-runs';
import { lengthUnit } from './length-units';
import { formatSignificant } from './number-format';
import { text } from './plot-axes';
import { lineNode, type SceneFact, type SceneNode } from './scene';
import { capHeightMm } from './text-layout';

export type Point3 = readonly [number, number, number];

export interface OverlayProjection {
  /** A point of the physics frame (bohr, z up; shared/physics/coordinates) → page position in mm. */
  project(point: Point3): [number, number];
  /** Page millimetres per bohr at the nucleus (sets the scale bar). */
  mmPerBohr: number;
  /** Length in bohr of the axes the renderer draws from the nucleus (names go just past their ends). */
  axisLengthBohr: number;
  /** Where the raster already draws a scale bar (mm): it is then labelled, not drawn again. */
  scaleBar?: {
    from: readonly [number, number];
    to: readonly [number, number];
    lengthBohr: number;
  } | null;
}

export interface Overlay3d {
  nodes: SceneNode[];
  facts: SceneFact[];
}

/**
 * The page projection of an orthographic view from where it puts the nucleus and the ends of the
 * three axes (each `axisLengthBohr` long), all in mm: p(x, y, z) = n + (x·e_x + y·e_y + z·e_z)/L,
 * e_i = end_i − n. Exact for orthographic views; for perspective ones it is right at the nucleus
 * and the axis ends and approximate elsewhere.
 */
export function linearProjection(
  nucleus: readonly [number, number],
  ends: {
    x: readonly [number, number];
    y: readonly [number, number];
    z: readonly [number, number];
  },
  axisLengthBohr: number,
): (point: Point3) => [number, number] {
  const e = [ends.x, ends.y, ends.z].map(([u, v]) => [
    (u - nucleus[0]) / axisLengthBohr,
    (v - nucleus[1]) / axisLengthBohr,
  ]);
  return ([x, y, z]) => [
    nucleus[0] + x * e[0][0] + y * e[1][0] + z * e[2][0],
    nucleus[1] + x * e[0][1] + y * e[1][1] + z * e[2][1],
  ];
}

const MARGIN_MM = 2;
/** The scale bar aims at this fraction of the figure's width (common practice for micrographs). */
const BAR_FRACTION = 0.2;
/** Axis ends closer than this to the nucleus on the page point at the viewer: no name is printed. */
const FORESHORTENED_MM = 1.5;

/** A round length (1, 2 or 5 × 10^k) not longer than `target`. */
function roundLength(target: number): number {
  const decade = Math.pow(10, Math.floor(Math.log10(target)));
  return [5, 2, 1].map((m) => m * decade).find((v) => v <= target * (1 + 1e-12)) ?? decade;
}

export function build3dOverlay(spec: ResolvedFigureSpec, projection: OverlayProjection): Overlay3d {
  const style = figureStyle(spec);
  const unit = lengthUnit(spec.system.lengthUnit);
  const { widthMm, heightMm } = spec.print;
  const nodes: SceneNode[] = [];
  const facts: SceneFact[] = [];
  const labelSize = style.fontSizePt * 1.15;

  if (spec.look.showLabel) {
    nodes.push(
      text(
        MARGIN_MM,
        MARGIN_MM + capHeightMm(labelSize),
        stateLabelRuns(spec.state.terms, spec.look.label),
        labelSize,
        'start',
        style.ink,
        'orbital-label',
      ),
    );
  }

  if (spec.look.showScaleBar && projection.mmPerBohr > 0) {
    const given = projection.scaleBar ?? null;
    let from: readonly [number, number];
    let to: readonly [number, number];
    let lengthUnits: number;
    if (given) {
      from = given.from;
      to = given.to;
      lengthUnits = given.lengthBohr * unit.perBohr;
    } else {
      const mmPerUnit = projection.mmPerBohr / unit.perBohr;
      lengthUnits = roundLength((BAR_FRACTION * widthMm) / mmPerUnit);
      const y = heightMm - MARGIN_MM - 1.5;
      from = [MARGIN_MM + 1, y];
      to = [MARGIN_MM + 1 + lengthUnits * mmPerUnit, y];
      nodes.push(
        lineNode(
          from[0],
          y,
          to[0],
          y,
          { colour: style.ink, widthPt: style.lineWidthPt * 2, cap: 'butt' },
          'scale-bar',
        ),
      );
      for (const x of [from[0], to[0]])
        nodes.push(
          lineNode(
            x,
            y - 0.8,
            x,
            y + 0.8,
            { colour: style.ink, widthPt: style.lineWidthPt },
            'scale-bar-end',
          ),
        );
    }
    const printed = `${formatSignificant(lengthUnits, lengthUnits >= 1 ? Math.max(1, Math.floor(Math.log10(lengthUnits)) + 1) : 1)} ${unit.symbol}`;
    facts.push({ name: 'scale bar length', value: lengthUnits, unit: unit.symbol, printed });
    nodes.push(
      text(
        (from[0] + to[0]) / 2,
        Math.min(from[1], to[1]) - 1.4,
        [{ text: printed, shift: 'base' }],
        style.smallSizePt,
        'middle',
        style.ink,
        'scale-bar-label',
      ),
    );
  }

  if (spec.look.showAxes) {
    const origin = projection.project([0, 0, 0]);
    const a = projection.axisLengthBohr;
    const ends: [string, Point3][] = [
      ['x', [a, 0, 0]],
      ['y', [0, a, 0]],
      ['z', [0, 0, a]],
    ];
    const cap = capHeightMm(style.fontSizePt);
    for (const [name, point] of ends) {
      const end = projection.project(point);
      const dx = end[0] - origin[0];
      const dy = end[1] - origin[1];
      const length = Math.hypot(dx, dy);
      if (length < FORESHORTENED_MM) continue;
      // Past the end along the axis, with the glyph's centre (not its baseline) on that line.
      const x = end[0] + (dx / length) * 2;
      const y = end[1] + (dy / length) * 2 + cap / 2;
      nodes.push(
        text(
          x,
          y,
          [{ text: name, shift: 'base', italic: true }],
          style.fontSizePt,
          'middle',
          style.ink,
          'axis-label',
        ),
      );
    }
  }
  return { nodes, facts };
}
