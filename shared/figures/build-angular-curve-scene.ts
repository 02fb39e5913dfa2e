/**
 * Angular curve figure (kind "angular", mode "curve"): the polar curve of the state's angular part
 * in a plane through the nucleus, drawn at distance |Y| from the origin in each direction; with
 * quantity "real" the lobes take the positive and negative phase colours, with "abs" one colour.
 *
 * The angular part is A(θ, φ) = Σ c Y_l^m(θ, φ) over the compiled state's terms (shared/physics
 * orbital-state, spherical-harmonic; Condon–Shortley, REFERENCE.md §5), i.e. the radial factors are
 * left out; for a single orbital this is exactly its (real or complex) spherical harmonic.
 * Directions in the plane follow shared/grid/slice-plane: u to the right, v up.
 */
import { cartesianToSpherical } from '../physics/coordinates';
import { compileState, type CompiledState } from '../physics/orbital-state';
import { sphericalHarmonic } from '../physics/spherical-harmonic';
import { bisectRoot } from '../physics/laguerre-zeros';
import { slicePlaneAxes, type SliceAxes } from '../grid/slice-plane';
import type { ResolvedFigureSpec } from '../spec/resolve-figure-spec';
import { FigureSpecError } from './figure-error';
import { figureStyle } from './figure-style';
import { describeSystem, orbitalStateOf } from './figure-system';
import { stateLabelRuns } from './label-runs';
import { formatFixed, formatSignificant } from './number-format';
import { snugTicks } from './nice-ticks';
import { text } from './plot-axes';
import { sceneForSpec } from './scene-for-spec';
import {
  circleCommands,
  lineNode,
  polylineCommands,
  runsText,
  type FigureScene,
  type SceneNode,
  type TextRun,
} from './scene';
import { capHeightMm } from './text-layout';

type AngularKind = Extract<ResolvedFigureSpec['kind'], { type: 'angular' }>;

const SAMPLES = 1440;
/** |A| below this fraction of its largest value counts as zero. */
const ZERO_FRACTION = 1e-12;
const MARGIN_MM = 1.5;

const italic = (t: string): TextRun => ({ text: t, shift: 'base', italic: true });
const plain = (t: string): TextRun => ({ text: t, shift: 'base' });

/** A(direction) for a unit vector d, complex. */
function angularPart(
  c: CompiledState,
  d: readonly [number, number, number],
): { re: number; im: number } {
  const s = cartesianToSpherical(d[0], d[1], d[2]);
  let re = 0;
  let im = 0;
  const y = { re: 0, im: 0 };
  for (const t of c.terms) {
    sphericalHarmonic(t.l, t.m, s.theta, s.phi, y);
    re += t.coefficient.re * y.re - t.coefficient.im * y.im;
    im += t.coefficient.re * y.im + t.coefficient.im * y.re;
  }
  return { re, im };
}

function direction(axes: SliceAxes, alpha: number): [number, number, number] {
  const ca = Math.cos(alpha);
  const sa = Math.sin(alpha);
  return [
    ca * axes.u[0] + sa * axes.v[0],
    ca * axes.u[1] + sa * axes.v[1],
    ca * axes.u[2] + sa * axes.v[2],
  ];
}

export function buildAngularCurveScene(spec: ResolvedFigureSpec): FigureScene {
  if (spec.kind.type !== 'angular' || spec.kind.mode !== 'curve') {
    throw new FigureSpecError(
      'kind.mode',
      'an angular curve needs kind "angular" with mode "curve"; surfaces are drawn by the 3D renderer',
    );
  }
  const kind: AngularKind = spec.kind;
  const style = figureStyle(spec);
  const c = compileState(orbitalStateOf(spec));
  if (kind.quantity === 'real' && !c.isReal) {
    throw new FigureSpecError(
      'kind.quantity',
      'the angular part of this state is complex (complex weights or time evolution); choose "abs"',
    );
  }
  const axes = slicePlaneAxes(kind.plane);
  const signed = kind.quantity === 'real';
  const value = (alpha: number): number => {
    const a = angularPart(c, direction(axes, alpha));
    return signed ? a.re : Math.hypot(a.re, a.im);
  };
  const alphas = Array.from({ length: SAMPLES + 1 }, (_, i) => (2 * Math.PI * i) / SAMPLES);
  const values = alphas.map(value);
  const largest = Math.max(...values.map(Math.abs));
  if (!(largest > 1e-12))
    throw new FigureSpecError(
      'kind.plane',
      'the angular part vanishes in this plane (a nodal plane); choose another plane',
    );

  // Directions where A changes sign: lobe ends, and nodal lines of the plane. Values below
  // ZERO_FRACTION of the largest count as zero (rounding of cos and sin at multiples of π/2).
  const nodes: number[] = [];
  if (signed) {
    const zero = ZERO_FRACTION * largest;
    const sign = (v: number): number => (Math.abs(v) <= zero ? 0 : Math.sign(v));
    const start = values.findIndex((v) => sign(v) !== 0);
    let lastSign = sign(values[start]);
    let lastIndex = start;
    for (let k = 1; k <= SAMPLES; k++) {
      const i = start + k;
      const v = value(alphas[i % SAMPLES] + (i >= SAMPLES ? 2 * Math.PI : 0));
      const sg = sign(v);
      if (sg === 0) continue;
      if (sg !== lastSign) {
        const a = start + (lastIndex - start);
        const from = (2 * Math.PI * a) / SAMPLES;
        const to = (2 * Math.PI * i) / SAMPLES;
        // A zero run between the two signs: its middle; else the root between the neighbours.
        const node = i - a > 1 ? (from + to) / 2 : bisectRoot(value, from, to);
        nodes.push(node % (2 * Math.PI));
      }
      lastSign = sg;
      lastIndex = i;
    }
    nodes.sort((p, q) => p - q);
  }

  // Layout: title, then a square plot centred on the nucleus with room for axis names.
  const { widthMm, heightMm } = spec.print;
  const titleSize = style.fontSizePt;
  const top = MARGIN_MM + capHeightMm(titleSize) + 3;
  const labelRoom = 5;
  const radiusMm = Math.min(widthMm - 2 * MARGIN_MM, heightMm - top - MARGIN_MM) / 2 - labelRoom;
  if (radiusMm < 10)
    throw new FigureSpecError(
      'print',
      `${widthMm} × ${heightMm} mm is too small for an angular curve`,
    );
  const cx = widthMm / 2;
  const cy = top + labelRoom + radiusMm;
  const ticks = snugTicks(0, largest, 3, 4);
  const scale = radiusMm / ticks.max;
  const at = (alpha: number, r: number): [number, number] => [
    cx + r * scale * Math.cos(alpha),
    cy - r * scale * Math.sin(alpha),
  ];

  const out: SceneNode[] = [];
  const faint = { colour: style.faint, widthPt: style.axisWidthPt * 0.8 };
  for (const t of ticks.values.slice(1))
    out.push({
      type: 'path',
      commands: circleCommands(cx, cy, t * scale),
      stroke: { ...faint, dashPt: [1, 1.2] },
      role: 'scale-circle',
    });
  const reach = radiusMm + 1.5;
  out.push(
    lineNode(
      cx - reach,
      cy,
      cx + reach,
      cy,
      { colour: style.muted, widthPt: style.axisWidthPt },
      'axis',
    ),
  );
  out.push(
    lineNode(
      cx,
      cy + reach,
      cx,
      cy - reach,
      { colour: style.muted, widthPt: style.axisWidthPt },
      'axis',
    ),
  );
  const [uName, vName] =
    typeof kind.plane === 'string' ? [kind.plane[0], kind.plane[1]] : ['u', 'v'];
  const small = style.smallSizePt;
  out.push(
    text(
      cx + reach + 0.8,
      cy + capHeightMm(small) / 2,
      [italic(uName)],
      style.fontSizePt,
      'start',
      style.ink,
      'axis-label',
    ),
  );
  out.push(
    text(cx, cy - reach - 1, [italic(vName)], style.fontSizePt, 'middle', style.ink, 'axis-label'),
  );
  // Scale values along the diagonal direction where the curve stays smallest, clear of the axes.
  const diagonals = [-1, 1, 3, 5].map((k) => (k * Math.PI) / 4);
  const reachNear = (d: number): number =>
    Math.max(
      ...alphas
        .filter((a) => Math.abs(Math.atan2(Math.sin(a - d), Math.cos(a - d))) < 0.35)
        .map((a) => Math.abs(value(a))),
    );
  const labelAngle = diagonals.reduce(
    (best, d) => (reachNear(d) < reachNear(best) - 1e-9 ? d : best),
    diagonals[0],
  );
  const reachAtLabels = reachNear(labelAngle);
  for (const t of ticks.values.slice(1)) {
    // A value inside a lobe would sit on the filled curve: only circles outside it are numbered.
    if (t < reachAtLabels * 1.05) continue;
    const [x, y] = at(labelAngle, t);
    out.push(
      text(
        x + 0.6,
        y + capHeightMm(small) + 0.4,
        [plain(formatFixed(t, ticks.decimals))],
        small * 0.9,
        'start',
        style.muted,
        'scale-label',
      ),
    );
  }
  if (spec.look.showNodalSurfaces) {
    for (const a of nodes.filter((n) => n < Math.PI - 1e-9)) {
      const [x1, y1] = at(a, ticks.max);
      const [x2, y2] = at(a + Math.PI, ticks.max);
      out.push(
        lineNode(
          x1,
          y1,
          x2,
          y2,
          { colour: style.muted, widthPt: style.axisWidthPt, dashPt: [2, 1.5] },
          'nodal-line',
        ),
      );
    }
  }

  // Lobes: runs of one sign between consecutive nodes, each closed through the origin.
  const lobes: { points: [number, number][]; positive: boolean }[] = [];
  if (signed && nodes.length > 0) {
    const cuts = [...nodes, nodes[0] + 2 * Math.PI];
    for (let k = 0; k + 1 < cuts.length; k++) {
      const from = cuts[k];
      const to = cuts[k + 1];
      const mid = value((from + to) / 2);
      if (to - from < 1e-9) continue;
      const pts: [number, number][] = [at(from, 0)];
      const steps = Math.max(8, Math.ceil(((to - from) / (2 * Math.PI)) * SAMPLES));
      for (let s = 1; s < steps; s++) {
        const a = from + ((to - from) * s) / steps;
        pts.push(at(a, Math.abs(value(a))));
      }
      pts.push(at(to, 0));
      lobes.push({ points: pts, positive: mid > 0 });
    }
  } else {
    const positive = !signed || values[0] >= 0;
    lobes.push({
      points: alphas.slice(0, SAMPLES).map((a, i) => at(a, Math.abs(values[i]))),
      positive,
    });
  }
  for (const lobe of lobes) {
    const colour = lobe.positive ? style.positive : style.negative;
    out.push({
      type: 'path',
      commands: polylineCommands(lobe.points, true),
      fill: { colour, opacity: 0.22 },
      stroke: { colour, widthPt: style.lineWidthPt * 1.5, join: 'round' },
      role: lobe.positive ? 'lobe-positive' : 'lobe-negative',
    });
  }

  const stateRuns = stateLabelRuns(spec.state.terms, spec.look.label);
  const planeName = typeof kind.plane === 'string' ? `${kind.plane}-plane` : 'chosen plane';
  const quantityRuns: TextRun[] = signed ? [italic('Y')] : [plain('|'), italic('Y'), plain('|')];
  const titleRuns: TextRun[] = [
    ...(spec.look.showLabel ? [...stateRuns, plain(', ')] : []),
    ...quantityRuns,
    plain(` in the ${planeName}`),
  ];
  out.push(
    text(
      MARGIN_MM,
      MARGIN_MM + capHeightMm(titleSize),
      titleRuns,
      titleSize,
      'start',
      style.ink,
      'title',
    ),
  );

  const name = runsText(stateRuns);
  const notes: string[] = [
    'Each direction is drawn at a distance |Y| from the origin; the dashed circles give the scale of |Y|.',
  ];
  if (new Set(c.terms.map((t) => t.n)).size > 1 || new Set(c.terms.map((t) => t.l)).size > 1) {
    notes.push(
      'The curve shows the angular part Σ c Y of the terms with their radial factors left out; for terms of different n or l the shape of ψ also depends on r.',
    );
  }
  return sceneForSpec(spec, out, {
    title: `${name}: angular ${signed ? 'function' : 'magnitude'} in the ${planeName} (${describeSystem(spec)})`,
    altText: `Polar curve of ${signed ? 'the angular function' : 'the magnitude of the angular function'} of ${name} in the ${planeName}: ${lobes.length} lobe${lobes.length === 1 ? '' : 's'}${signed ? ` (${lobes.filter((l) => l.positive).length} positive, ${lobes.filter((l) => !l.positive).length} negative)` : ''}, largest |Y| = ${formatSignificant(largest, 3)}.`,
    facts: [],
    notes,
  });
}
