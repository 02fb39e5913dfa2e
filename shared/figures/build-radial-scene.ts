/**
 * Radial plot figure: R_nl, the radial distribution r²R²_nl, the cumulative probability P_nl(r) and
 * the effective potential V_eff = −Z/r + l(l+1)/(2μr²) with its bound levels, several curves per
 * panel with a legend; curves of different quantities get stacked panels sharing the r axis.
 * Node markers and the most probable radius carry their computed values.
 *
 * Physics from shared/physics (radial-function, radial-nodes, most-probable-radius, radial-probability,
 * radius-enclosing-probability, effective-potential; sources named there). Lengths are computed in
 * bohr and printed in the spec's unit; R is printed in unit^(−3/2), r²R² in unit^(−1), so the
 * printed curves stay normalised in the printed unit. Energies: hartree with bohr, eV with pm or Å.
 * kind.rMax is in bohr, like every extent in the spec. Uploaded data sets named in kind.datasets
 * are drawn in the panel of their quantity from the points the caller passes (radial-datasets.ts).
 */
import { HARTREE_EV } from '../physics/constants';
import { effectivePotentialCurve, type BoundLevel } from '../physics/effective-potential';
import { mostProbableRadius } from '../physics/most-probable-radius';
import { radialFunction } from '../physics/radial-function';
import { radialNodes } from '../physics/radial-nodes';
import { cumulativeRadialProbability } from '../physics/radial-probability';
import { radiusEnclosingProbability } from '../physics/radius-enclosing-probability';
import type { ResolvedFigureSpec } from '../spec/resolve-figure-spec';
import { clipPolyline } from './clip-polyline';
import { dataSeriesNodes, dataSeriesOf, seriesRange, type DataSeries, type FigureDatasets } from './radial-datasets';
import { FigureSpecError } from './figure-error';
import { sceneForSpec } from './scene-for-spec';
import { solvedRadialSet, type SolvedRadialSet } from './solved-radial-set';
import { figureStyle, type FigureStyle } from './figure-style';
import { describeSystem, systemMassRatio } from './figure-system';
import { shellRuns } from './label-runs';
import { LabelPlacer, placeNear, type NearPlacement } from './label-placer';
import { legendAvoiding, type LegendEntry } from './legend';
import { lengthUnit, type LengthUnit } from './length-units';
import { formatSignificant } from './number-format';
import {
  axisNodes,
  linearScale,
  makeAxis,
  text,
  xAxisHeightMm,
  yAxisWidthMm,
  type AxisDef,
  type Frame,
} from './plot-axes';
import {
  circleCommands,
  lineNode,
  polylineCommands,
  runsText,
  type FigureScene,
  type SceneFact,
  type SceneNode,
  type Stroke,
  type TextRun,
} from './scene';
import { capHeightMm } from './text-layout';

type RadialKind = Extract<ResolvedFigureSpec['kind'], { type: 'radial' }>;
type Quantity = RadialKind['curves'][number]['quantity'];
type Curve = RadialKind['curves'][number];

const SAMPLES = 600;
/** Probability inside the automatic r range for R, r²R² and P(r) curves. */
const AUTO_RANGE_PROBABILITY = 0.995;
/** The automatic r range of a V_eff panel reaches this many outer turning points. */
const AUTO_RANGE_TURNING_POINTS = 1.6;
const PANEL_GAP_MM = 5;
const MARGIN_MM = 1.2;

interface Context {
  spec: ResolvedFigureSpec;
  style: FigureStyle;
  unit: LengthUnit;
  Z: number;
  mu: number;
  energyUnit: { symbol: string; perHartree: number };
  facts: SceneFact[];
  colourOf: (c: Curve) => Stroke;
  dataStroke: (s: DataSeries) => Stroke;
  /** States of curves with source "solved" (kind.potential solved numerically). */
  solved: SolvedRadialSet;
}

const italic = (t: string): TextRun => ({ text: t, shift: 'base', italic: true });
const plain = (t: string): TextRun => ({ text: t, shift: 'base' });
const sup = (t: string): TextRun => ({ text: t, shift: 'sup' });
const sub = (t: string): TextRun => ({ text: t, shift: 'sub' });

function quantityTitle(q: Quantity): TextRun[] {
  switch (q) {
    case 'R':
      return [italic('R'), plain('('), italic('r'), plain(')')];
    case 'r2R2':
      return [italic('r'), sup('2'), italic('R'), sup('2')];
    case 'cumulative':
      return [plain('Probability within '), italic('r')];
    case 'veff':
      return [italic('V'), sub('eff')];
  }
}

function quantityUnit(q: Quantity, ctx: Context): TextRun[] {
  const u = ctx.unit.symbol;
  if (q === 'R') return [plain(u), sup('\u22123/2')];
  if (q === 'r2R2') return [plain(u), sup('\u22121')];
  if (q === 'veff') return [plain(ctx.energyUnit.symbol)];
  return [];
}

/** Printed value of a radial quantity at r (bohr). */
function curveValue(c: Curve, r: number, ctx: Context): number {
  const p = ctx.unit.perBohr;
  const solved = ctx.solved.curveOf(c);
  if (solved) {
    if (c.quantity === 'R') return solved.R(r) / Math.pow(p, 1.5);
    return c.quantity === 'r2R2' ? solved.r2R2(r) / p : solved.cumulative(r);
  }
  if (c.quantity === 'R') return radialFunction(c.n, c.l, r, ctx.Z, ctx.mu) / Math.pow(p, 1.5);
  if (c.quantity === 'r2R2') {
    const R = radialFunction(c.n, c.l, r, ctx.Z, ctx.mu);
    return (r * r * R * R) / p;
  }
  return cumulativeRadialProbability(c.n, c.l, r, ctx.Z, ctx.mu);
}

function autoRange(curves: readonly Curve[], ctx: Context): number {
  let r = 0;
  for (const c of curves) {
    if (c.quantity === 'veff') {
      const levels = effectivePotentialCurve({
        l: c.l,
        Z: ctx.Z,
        muRatio: ctx.mu,
        rMin: 1e-3,
        rMax: 1,
        points: 2,
        nMax: c.n,
      }).levels;
      r = Math.max(r, AUTO_RANGE_TURNING_POINTS * levels[levels.length - 1].outerTurningPoint);
    } else {
      const solved = ctx.solved.curveOf(c);
      r = Math.max(
        r,
        solved
          ? solved.radiusEnclosing(AUTO_RANGE_PROBABILITY)
          : radiusEnclosingProbability(c.n, c.l, AUTO_RANGE_PROBABILITY, ctx.Z, ctx.mu),
      );
    }
  }
  return r;
}

interface Panel {
  quantity: Quantity;
  curves: Curve[];
  data: DataSeries[];
}

/** A data value in the printed unit of its panel (R and r²R² scale with the length unit). */
function printedData(s: DataSeries, v: number, ctx: Context): number {
  const p = ctx.unit.perBohr;
  if (s.panel === 'R') return v / Math.pow(p, 1.5);
  if (s.panel === 'r2R2') return v / p;
  return v * ctx.energyUnit.perHartree;
}

const dataLegend = (panel: Panel, ctx: Context): LegendEntry[] =>
  panel.data.map((s) => ({ runs: [plain(s.label)], stroke: ctx.dataStroke(s) }));

function checkCurves(kind: RadialKind): void {
  kind.curves.forEach((c, i) => {
    if (c.l >= c.n)
      throw new FigureSpecError(
        `kind.curves[${i}].l`,
        `l must be less than n = ${c.n}, got ${c.l}`,
      );
  });
  if (kind.rMax !== undefined && !(kind.rMax > 0))
    throw new FigureSpecError('kind.rMax', 'must be a positive number of bohr');
}

function curveKey(c: Curve): string {
  return `${c.n},${c.l}${c.source === 'solved' ? ',solved' : ''}`;
}

/** "2s", or "2s (solved)" / "2s (hydrogen)" where the figure draws solved states. */
function curveRuns(c: Curve, ctx: Context): TextRun[] {
  const suffix = ctx.solved.suffix(c);
  return suffix ? [...shellRuns(c.n, c.l), plain(suffix)] : shellRuns(c.n, c.l);
}

/** The label and, when it sits away from its point, a thin leader line to it. */
function placedNodes(p: NearPlacement, style: FigureStyle): SceneNode[] {
  if (!p.leader) return [p.label];
  const [[x1, y1], [x2, y2]] = p.leader;
  return [
    lineNode(x1, y1, x2, y2, { colour: style.muted, widthPt: style.axisWidthPt * 0.7 }, 'leader'),
    p.label,
  ];
}

function valueRuns(value: number, unit: string): TextRun[] {
  return [plain(`${formatSignificant(value, 3)} ${unit}`)];
}

interface FunctionData {
  yAxis: AxisDef;
  rs: number[];
  series: number[][];
}

/** Sampled values and the y axis of a panel of R, r²R² or P(r) curves. */
function functionData(panel: Panel, rMaxBohr: number, ctx: Context): FunctionData {
  const rs = Array.from({ length: SAMPLES + 1 }, (_, i) => (rMaxBohr * i) / SAMPLES);
  const series = panel.curves.map((c) => rs.map((r) => curveValue(c, r, ctx)));
  const fromData = seriesRange(panel.data, rMaxBohr, (s, v) => printedData(s, v, ctx));
  let lo = Math.min(0, fromData.lo);
  let hi = Math.max(0, fromData.hi);
  for (const s of series)
    for (const v of s) {
      lo = Math.min(lo, v);
      hi = Math.max(hi, v);
    }
  if (panel.quantity === 'cumulative') hi = 1;
  const yAxis = makeAxis(
    lo,
    panel.quantity === 'cumulative' ? 1 : hi * 1.04,
    quantityTitle(panel.quantity),
    quantityUnit(panel.quantity, ctx),
    panel.quantity === 'cumulative',
  );
  return { yAxis, rs, series };
}

/** Drawing of one panel of R, r²R² or P(r) curves with node and most-probable-radius marks. */
function functionPanel(
  panel: Panel,
  data: FunctionData,
  frame: Frame,
  xAxis: AxisDef,
  rMaxBohr: number,
  ctx: Context,
  showXLabels: boolean,
  placer: LabelPlacer,
): SceneNode[] {
  const { style, unit } = ctx;
  const { yAxis, rs, series } = data;
  const nodes: SceneNode[] = axisNodes(frame, xAxis, yAxis, style, {
    xLabels: showXLabels,
    zeroLine: true,
  });
  const yScale = Math.pow(10, -yAxis.exponent);
  const sx = linearScale(xAxis.ticks.min, xAxis.ticks.max, frame.x0, frame.x1);
  const sy = linearScale(yAxis.ticks.min, yAxis.ticks.max, frame.y1, frame.y0);
  const X = (rBohr: number): number => sx(rBohr * unit.perBohr * Math.pow(10, -xAxis.exponent));
  const Y = (v: number): number => sy(v * yScale);

  const drawn: [number, number][] = [];
  panel.curves.forEach((c, i) => {
    const pts = rs.map((r, k) => [X(r), Y(series[i][k])] as [number, number]);
    for (const piece of clipPolyline(pts, {
      x0: frame.x0,
      y0: frame.y0 - 0.01,
      x1: frame.x1,
      y1: frame.y1 + 0.01,
    })) {
      nodes.push({
        type: 'path',
        commands: polylineCommands(piece),
        stroke: ctx.colourOf(c),
        role: 'curve',
      });
      drawn.push(...piece);
    }
  });
  for (const s of panel.data)
    nodes.push(...dataSeriesNodes(s, X, (v) => Y(printedData(s, v, ctx)), frame, ctx.dataStroke(s), drawn));
  placer.avoidCurve(drawn);
  const entries: LegendEntry[] = [
    ...panel.curves.map((c) => ({ runs: curveRuns(c, ctx), stroke: ctx.colourOf(c) })),
    ...dataLegend(panel, ctx),
  ];
  const key = legendAvoiding(entries, frame, style.smallSizePt, style.ink, drawn);
  placer.occupy(key.box);
  nodes.push(...key.nodes);

  const markerSize = style.smallSizePt * 0.92;
  const cap = capHeightMm(markerSize);
  for (const c of panel.curves) {
    const name = runsText(curveRuns(c, ctx));
    const stroke = ctx.colourOf(c);
    const solved = ctx.solved.curveOf(c);
    if (
      ctx.spec.kind.type === 'radial' &&
      ctx.spec.kind.showNodes &&
      panel.quantity !== 'cumulative'
    ) {
      for (const node of solved?.nodes ?? radialNodes(c.n, c.l, ctx.Z, ctx.mu)) {
        if (node > rMaxBohr) continue;
        const x = X(node);
        const y = Y(0);
        nodes.push({
          type: 'path',
          commands: circleCommands(x, y, 0.75),
          stroke: { ...stroke, dashPt: undefined },
          role: 'node-marker',
        });
        const printed = formatSignificant(node * unit.perBohr, 3);
        ctx.facts.push({
          name: `${name} radial node`,
          value: node * unit.perBohr,
          unit: unit.symbol,
          printed: `${printed} ${unit.symbol}`,
        });
        const runs = valueRuns(node * unit.perBohr, unit.symbol);
        const placed = placeNear(placer, [x, y], cap, (lx, ly, anchor) =>
          text(lx, ly, runs, markerSize, anchor, stroke.colour, 'node-label'),
        );
        if (placed) nodes.push(...placedNodes(placed, style));
      }
    }
    if (
      ctx.spec.kind.type === 'radial' &&
      ctx.spec.kind.showMostProbable &&
      panel.quantity === 'r2R2'
    ) {
      const rp = solved?.mostProbableRadius ?? mostProbableRadius(c.n, c.l, ctx.Z, ctx.mu);
      if (rp > rMaxBohr) continue;
      const peak = curveValue(c, rp, ctx);
      const x = X(rp);
      const y = Y(peak);
      nodes.push(
        lineNode(
          x,
          y,
          x,
          frame.y1,
          { colour: stroke.colour, widthPt: style.axisWidthPt, dashPt: [1.5, 1.2] },
          'most-probable-line',
        ),
      );
      const printed = `${formatSignificant(rp * unit.perBohr, 3)} ${unit.symbol}`;
      ctx.facts.push({
        name: `${name} most probable radius`,
        value: rp * unit.perBohr,
        unit: unit.symbol,
        printed,
      });
      const runs: TextRun[] = [italic('r'), sub('mp'), plain(` = ${printed}`)];
      const placed = placeNear(placer, [x, y], cap, (lx, ly, anchor) =>
        text(lx, ly, runs, markerSize, anchor, stroke.colour, 'most-probable-label'),
      );
      if (placed) nodes.push(...placedNodes(placed, style));
    }
  }
  return nodes;
}

function curvesByL(panel: Panel): Map<number, Curve[]> {
  const byL = new Map<number, Curve[]>();
  for (const c of panel.curves) byL.set(c.l, [...(byL.get(c.l) ?? []), c]);
  return byL;
}

/** The energy axis of a V_eff panel: deep enough for the lowest level asked for (or the well's bottom). */
function potentialAxis(panel: Panel, ctx: Context): AxisDef {
  let lo = 0;
  for (const [l, curves] of curvesByL(panel)) {
    const nMax = Math.max(...curves.map((c) => c.n));
    const levels = effectivePotentialCurve({
      l,
      Z: ctx.Z,
      muRatio: ctx.mu,
      rMin: 1e-3,
      rMax: 1,
      points: 2,
      nMax,
    }).levels;
    const lowest = Math.min(
      ...levels.filter((lv) => curves.some((c) => c.n === lv.n)).map((lv) => lv.energy),
    );
    const vMin = l === 0 ? -Infinity : (-ctx.mu * ctx.Z * ctx.Z) / (2 * l * (l + 1));
    lo = Math.min(lo, l === 0 ? 1.6 * lowest : 1.25 * Math.min(lowest, vMin));
  }
  const e = ctx.energyUnit.perHartree;
  if (panel.curves.length === 0) {
    // Only uploaded potentials: the axis spans their values (in the printed energy unit), and is
    // called V, as nothing says the data include the centrifugal term.
    const { lo: dLo, hi: dHi } = seriesRange(panel.data, Infinity, (s, v) => printedData(s, v, ctx));
    return makeAxis(Math.min(0, dLo), Math.max(0, dHi) + 0.05 * (dHi - dLo), [italic('V')], quantityUnit('veff', ctx));
  }
  return makeAxis(lo * e, 0.4 * Math.abs(lo) * e, quantityTitle('veff'), quantityUnit('veff', ctx));
}

/** A panel of V_eff curves (one per l) with each requested state's level between its turning points. */
function potentialPanel(
  panel: Panel,
  yAxis: AxisDef,
  frame: Frame,
  xAxis: AxisDef,
  rMaxBohr: number,
  ctx: Context,
  showXLabels: boolean,
  placer: LabelPlacer,
): SceneNode[] {
  const { style, unit, energyUnit } = ctx;
  const e = energyUnit.perHartree;
  const byL = curvesByL(panel);
  const nodes: SceneNode[] = axisNodes(frame, xAxis, yAxis, style, {
    xLabels: showXLabels,
    zeroLine: true,
  });
  const sx = linearScale(xAxis.ticks.min, xAxis.ticks.max, frame.x0, frame.x1);
  const sy = linearScale(yAxis.ticks.min, yAxis.ticks.max, frame.y1, frame.y0);
  const X = (rBohr: number): number => sx(rBohr * unit.perBohr * Math.pow(10, -xAxis.exponent));
  const Y = (hartree: number): number => sy(hartree * e * Math.pow(10, -yAxis.exponent));

  const entries: LegendEntry[] = [];
  const drawn: [number, number][] = [];
  const pending: { c: Curve; level: BoundLevel; stroke: Stroke }[] = [];
  for (const [l, curves] of byL) {
    const stroke = ctx.colourOf(curves[0]);
    entries.push({ runs: [italic('l'), plain(` = ${l}`)], stroke });
    const nMax = Math.max(...curves.map((c) => c.n));
    const curve = effectivePotentialCurve({
      l,
      Z: ctx.Z,
      muRatio: ctx.mu,
      rMin: rMaxBohr * 1e-4,
      rMax: rMaxBohr,
      points: 1200,
      nMax,
      spacing: 'log',
    });
    const pts = curve.r.map((r, i) => [X(r), Y(curve.V[i])] as [number, number]);
    for (const piece of clipPolyline(pts, frame)) {
      nodes.push({ type: 'path', commands: polylineCommands(piece), stroke, role: 'curve' });
      drawn.push(...piece);
    }
    for (const c of curves) {
      const level = curve.levels.find((lv) => lv.n === c.n);
      if (level) pending.push({ c, level, stroke });
    }
  }
  for (const s of panel.data) nodes.push(...dataSeriesNodes(s, X, Y, frame, ctx.dataStroke(s), drawn));
  entries.push(...dataLegend(panel, ctx));
  placer.avoidCurve(drawn);
  const key = legendAvoiding(entries, frame, style.smallSizePt, style.ink, drawn);
  placer.occupy(key.box);
  nodes.push(...key.nodes);

  const cap = capHeightMm(style.smallSizePt);
  const levelNodes: SceneNode[] = [];
  for (const { c, level, stroke } of pending) {
    const xa = Math.max(X(level.innerTurningPoint), frame.x0);
    const xb = Math.min(X(level.outerTurningPoint), frame.x1);
    const y = Y(level.energy);
    levelNodes.push(
      lineNode(
        xa,
        y,
        xb,
        y,
        { colour: stroke.colour, widthPt: style.lineWidthPt * 0.8, dashPt: [3, 1.5] },
        'level-line',
      ),
    );
    const value = level.energy * e;
    const printed = `${formatSignificant(value, 3)} ${energyUnit.symbol}`;
    ctx.facts.push({
      name: `${runsText(shellRuns(c.n, c.l))} energy`,
      value,
      unit: energyUnit.symbol,
      printed,
    });
    const runs: TextRun[] = [...shellRuns(c.n, c.l), plain(`: ${printed}`)];
    const size = style.smallSizePt * 0.92;
    const placed = placer.place([
      text(xb + 1, y + cap / 2, runs, size, 'start', style.ink, 'level-label'),
      text(xb - 1, y - 1, runs, size, 'end', style.ink, 'level-label'),
      text(xa + 1, y - 1, runs, size, 'start', style.ink, 'level-label'),
      text(xb - 1, y + cap + 1, runs, size, 'end', style.ink, 'level-label'),
      text(xa + 1, y + cap + 1, runs, size, 'start', style.ink, 'level-label'),
    ]);
    if (placed) levelNodes.push(placed);
  }
  nodes.push(...levelNodes);
  return nodes;
}

export function buildRadialScene(spec: ResolvedFigureSpec, datasets?: FigureDatasets): FigureScene {
  if (spec.kind.type !== 'radial')
    throw new FigureSpecError('kind.type', `expected "radial", got "${spec.kind.type}"`);
  const kind = spec.kind;
  checkCurves(kind);
  const solved = solvedRadialSet(spec);
  const style = figureStyle(spec);
  const unit = lengthUnit(spec.system.lengthUnit);
  const distinct = [...new Set(kind.curves.map(curveKey))];
  const strokes = new Map(
    distinct.map((k, i) => [
      k,
      {
        colour: style.curveColours[i % style.curveColours.length],
        widthPt: style.lineWidthPt * 1.4,
        dashPt: style.curveDashes[i % style.curveDashes.length],
        join: 'round' as const,
      },
    ]),
  );
  const ctx: Context = {
    spec,
    style,
    unit,
    Z: spec.system.Z,
    mu: systemMassRatio(spec),
    energyUnit:
      unit.key === 'bohr'
        ? { symbol: 'hartree', perHartree: 1 }
        : { symbol: 'eV', perHartree: HARTREE_EV },
    facts: [],
    colourOf: (c) => strokes.get(curveKey(c)) as Stroke,
    // Data sets take the colours after the computed curves', drawn solid (the points carry marks when sparse).
    dataStroke: (s) => ({
      colour: style.curveColours[(distinct.length + data.series.indexOf(s)) % style.curveColours.length],
      widthPt: style.lineWidthPt * 1.1,
      join: 'round',
    }),
    solved,
  };
  const data = dataSeriesOf(spec, datasets);

  const panels: Panel[] = [];
  for (const c of kind.curves) {
    const panel = panels.find((p) => p.quantity === c.quantity);
    if (panel) panel.curves.push(c);
    else panels.push({ quantity: c.quantity, curves: [c], data: [] });
  }
  for (const s of data.series) {
    const panel = panels.find((p) => p.quantity === s.panel);
    if (panel) panel.data.push(s);
    else panels.push({ quantity: s.panel, curves: [], data: [s] });
  }

  const fixed = kind.rMax !== undefined;
  const rMaxBohr = kind.rMax ?? Math.max(autoRange(kind.curves, ctx), ...data.series.map((s) => s.r[s.r.length - 1]));
  const xAxis = makeAxis(0, rMaxBohr * unit.perBohr, [italic('r')], [plain(unit.symbol)], fixed);
  const xEndBohr = (xAxis.ticks.max * Math.pow(10, xAxis.exponent)) / unit.perBohr;

  const { widthMm, heightMm } = spec.print;
  const prepared = panels.map((p) =>
    p.quantity === 'veff'
      ? { yAxis: potentialAxis(p, ctx), data: null }
      : (() => {
          const data = functionData(p, xEndBohr, ctx);
          return { yAxis: data.yAxis, data };
        })(),
  );
  const left = MARGIN_MM + Math.max(...prepared.map((p) => yAxisWidthMm(p.yAxis, style)));
  const right = widthMm - MARGIN_MM - 2.5;
  const top = MARGIN_MM + 1.5;
  const bottom = heightMm - MARGIN_MM - xAxisHeightMm(style);
  const panelHeight = (bottom - top - PANEL_GAP_MM * (panels.length - 1)) / panels.length;
  if (panelHeight < 15 || right - left < 25) {
    throw new FigureSpecError(
      'print',
      `${widthMm} × ${heightMm} mm is too small for ${panels.length} panel(s) of radial curves`,
    );
  }

  const nodes: SceneNode[] = [];
  panels.forEach((panel, i) => {
    const frame: Frame = {
      x0: left,
      y0: top + i * (panelHeight + PANEL_GAP_MM),
      x1: right,
      y1: top + i * (panelHeight + PANEL_GAP_MM) + panelHeight,
    };
    const placer = new LabelPlacer({
      x0: frame.x0 + 0.5,
      y0: frame.y0 - 1,
      x1: widthMm - 0.5,
      y1: frame.y1 - 0.3,
    });
    const last = i === panels.length - 1;
    const { yAxis, data } = prepared[i];
    const group =
      data === null
        ? potentialPanel(panel, yAxis, frame, xAxis, xEndBohr, ctx, last, placer)
        : functionPanel(panel, data, frame, xAxis, xEndBohr, ctx, last, placer);
    nodes.push({ type: 'group', children: group, role: `panel-${panel.quantity}` });
  });

  const names = distinct.map((k) => runsText(curveRuns(kind.curves.find((c) => curveKey(c) === k) as Curve, ctx)));
  const quantityWords: Record<Quantity, string> = {
    R: 'radial function R(r)',
    r2R2: 'radial distribution r²R²',
    cumulative: 'probability within r',
    veff: 'effective potential V_eff',
  };
  const title = `Radial plot of ${names.join(', ')} (${describeSystem(spec)})`;
  const facts = ctx.facts.map((f) => `${f.name}: ${f.printed}`).join('; ');
  const drawnNames = (p: Panel) => [...p.curves.map((c) => runsText(curveRuns(c, ctx))), ...p.data.map((s) => `data "${s.label}"`)];
  const altText = `${panels.map((p) => `${quantityWords[p.quantity]} of ${drawnNames(p).join(', ')}`).join('; ')}, against r from 0 to ${formatSignificant(xEndBohr * unit.perBohr, 3)} ${unit.symbol}.${facts ? ` ${facts}.` : ''}`;
  const notes: string[] = [...data.notes, ...solved.notes];
  if (spec.system.nucleus !== 'infinite')
    notes.push(
      'Lengths are printed in units of the Bohr radius a0 (not the reduced-mass radius); the reduced mass enters the curves themselves.',
    );
  return sceneForSpec(spec, nodes, { title, altText, facts: ctx.facts, notes });
}
