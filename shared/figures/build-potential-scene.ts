/**
 * Effective-potential figure: a central potential V(r), the centrifugal term l(l+1)/(2μr²) and
 * V_eff(r) = V(r) + l(l+1)/(2μr²) for each chosen l, with the lowest solved levels of each l drawn
 * as horizontal lines between their classical turning points (V_eff = E) and labelled with their
 * energies; optionally hydrogen's levels (the potential's Coulomb tail or nuclear charge) dashed.
 *
 * Physics: the radial equation u'' = 2μ[V_eff(r) − E]u (any QM text, e.g. Griffiths 2nd ed. §4.1),
 * solved by shared/solver (Numerov shooting, Richardson-extrapolated; see solved-potential.ts).
 * Energies print with as many digits as their estimated error allows (at most six). Lengths in the
 * spec's unit; energies in hartree with bohr, eV with pm or Å. kind.rMax is in bohr.
 */
import type { ResolvedFigureSpec } from '../spec/resolve-figure-spec';
import { clipPolyline } from './clip-polyline';
import { FigureSpecError } from './figure-error';
import { figureStyle } from './figure-style';
import { systemMassRatio } from './figure-system';
import { shellRuns } from './label-runs';
import { LabelPlacer, placeNear } from './label-placer';
import { legend, type Legend, type LegendEntry } from './legend';
import { lengthUnit } from './length-units';
import { formatSignificant } from './number-format';
import {
  axisNodes,
  linearScale,
  makeAxis,
  text,
  xAxisHeightMm,
  yAxisWidthMm,
  type Frame,
} from './plot-axes';
import {
  lineNode,
  polylineCommands,
  runsText,
  type FigureScene,
  type SceneFact,
  type SceneNode,
  type Stroke,
  type TextRun,
} from './scene';
import type { RadialSolution } from '../solver/solve-radial';
import { sceneForSpec } from './scene-for-spec';
import {
  effectiveValue,
  energyUnitFor,
  printedEnergy,
  solvePotential,
  solverNote,
  turningPoints,
} from './solved-potential';
import { capHeightMm, textBox, type Box } from './text-layout';

const MARGIN_MM = 1.2;
/** Samples of each curve: half logarithmic (the steep inner part), half linear. */
const HALF_SAMPLES = 700;
/** The automatic r range reaches this many times the outermost turning point drawn. */
const AUTO_RANGE_TURNING_POINTS = 1.35;

const italic = (t: string): TextRun => ({ text: t, shift: 'base', italic: true });
const plain = (t: string): TextRun => ({ text: t, shift: 'base' });
const sub = (t: string): TextRun => ({ text: t, shift: 'sub' });
const sup = (t: string): TextRun => ({ text: t, shift: 'sup' });

interface DrawnLevel {
  n: number;
  l: number;
  energy: number;
  error: number;
  inner: number;
  outer: number;
  stroke: Stroke;
}

/** The legend in whichever of the four corners covers fewest drawn points (wells leave the lower right empty). */
function legendInEmptiestCorner(
  entries: readonly LegendEntry[],
  frame: Frame,
  sizePt: number,
  colour: string,
  points: readonly (readonly [number, number])[],
): Legend {
  const top = [
    legend(entries, frame, sizePt, colour, 'top-right'),
    legend(entries, frame, sizePt, colour, 'top-left'),
  ];
  const height = top[0].box.y1 - top[0].box.y0;
  const lowered = { ...frame, y0: frame.y1 - height - 2.5 };
  const bottom = [
    legend(entries, lowered, sizePt, colour, 'top-right'),
    legend(entries, lowered, sizePt, colour, 'top-left'),
  ];
  const m = 1.5;
  const covered = (b: Box): number =>
    points.filter(([x, y]) => x >= b.x0 - m && x <= b.x1 + m && y >= b.y0 - m && y <= b.y1 + m)
      .length;
  return [...top, ...bottom].reduce((best, c) => (covered(c.box) < covered(best.box) ? c : best));
}

function sampleRadii(rEnd: number): number[] {
  const out: number[] = [];
  const rStart = rEnd * 1e-4;
  for (let i = 0; i < HALF_SAMPLES; i++)
    out.push(rStart * Math.pow(rEnd / rStart, i / (HALF_SAMPLES - 1)));
  for (let i = 1; i <= HALF_SAMPLES; i++) out.push((rEnd * i) / HALF_SAMPLES);
  return out.sort((a, b) => a - b);
}

export function buildPotentialScene(spec: ResolvedFigureSpec): FigureScene {
  if (spec.kind.type !== 'potential')
    throw new FigureSpecError('kind.type', `expected "potential", got "${spec.kind.type}"`);
  const kind = spec.kind;
  const style = figureStyle(spec);
  const unit = lengthUnit(spec.system.lengthUnit);
  const energyUnit = energyUnitFor(unit);
  const e = energyUnit.perHartree;
  const mu = systemMassRatio(spec);
  const { potential, solutions } = solvePotential(
    kind.potential,
    kind.l.map((l) => ({ l, levels: kind.levels, clamp: true })),
    mu,
    {
      potential: 'kind.potential',
      l: (l) => `kind.l[${kind.l.indexOf(l)}]`,
      levels: () => 'kind.levels',
    },
  );
  const strokeOf = (i: number): Stroke => ({
    colour: style.curveColours[i % style.curveColours.length],
    widthPt: style.lineWidthPt * 1.3,
    join: 'round',
  });

  const levels: DrawnLevel[] = solutions.flatMap((s, i) =>
    (s === null ? [] : s.levels).map((lv) => {
      const [inner, outer] = turningPoints(s as RadialSolution, potential, lv.energy);
      return {
        n: lv.n,
        l: lv.l,
        energy: lv.energy,
        error: lv.error,
        inner,
        outer,
        stroke: strokeOf(i),
      };
    }),
  );
  const solved = solutions.flatMap((s) => s?.levels ?? []);
  const hydrogen = kind.compareHydrogen ? solved.filter((lv) => lv.hydrogen) : [];

  // Ranges: r to past the outermost turning point; energies from below the lowest level to above
  // the threshold (or the highest level of a confining potential).
  const wall = potential.hardWall;
  const outermost = Math.max(potential.lengthScale * 4, ...levels.map((lv) => lv.outer));
  let rMaxBohr =
    kind.rMax ?? (wall !== undefined ? 1.15 * wall : AUTO_RANGE_TURNING_POINTS * outermost);
  if (kind.rMax === undefined && potential.outerLimit !== undefined)
    rMaxBohr = Math.min(rMaxBohr, potential.outerLimit);
  const xAxis = makeAxis(
    0,
    rMaxBohr * unit.perBohr,
    [italic('r')],
    [plain(unit.symbol)],
    kind.rMax !== undefined,
  );
  const xEndBohr = (xAxis.ticks.max * Math.pow(10, xAxis.exponent)) / unit.perBohr;
  // V is drawn only where it is defined: inside a table's range, inside a hard wall.
  const rs = sampleRadii(Math.min(xEndBohr, potential.outerLimit ?? Infinity)).filter(
    (r) => (wall === undefined || r <= wall) && r >= (potential.innerLimit ?? 0),
  );
  const threshold = potential.asymptotes.threshold;
  // With no bound level at all, the energy axis spans the well down to its bottom.
  const energies = levels.length ? levels.map((lv) => lv.energy) : [threshold];
  let vMin = Infinity;
  for (const r of rs)
    if (r > potential.lengthScale * 0.05) vMin = Math.min(vMin, potential.evaluate(r));
  const eLow = Math.min(...energies, levels.length ? Infinity : vMin);
  const eHigh = Math.max(...energies);
  let lo: number;
  let hi: number;
  if (Number.isFinite(threshold)) {
    const span = Math.max(threshold - eLow, 1e-12);
    lo = Math.max(Math.min(vMin, eLow), eLow - 0.5 * span) - 0.08 * span;
    hi = threshold + 0.15 * span;
  } else {
    const bottom = Math.min(vMin, eLow, 0);
    lo = bottom - 0.08 * (eHigh - bottom);
    hi = eHigh + 0.3 * (eHigh - bottom);
  }
  const yAxis = makeAxis(
    lo * e,
    hi * e,
    [italic('E'), plain(', '), italic('V')],
    [plain(energyUnit.symbol)],
  );

  const { widthMm, heightMm } = spec.print;
  const frame: Frame = {
    x0: MARGIN_MM + yAxisWidthMm(yAxis, style),
    y0: MARGIN_MM + 1.5,
    x1: widthMm - MARGIN_MM - 2.5,
    y1: heightMm - MARGIN_MM - xAxisHeightMm(style),
  };
  if (frame.y1 - frame.y0 < 25 || frame.x1 - frame.x0 < 30)
    throw new FigureSpecError(
      'print',
      `${widthMm} × ${heightMm} mm is too small for an effective-potential figure`,
    );
  const sx = linearScale(xAxis.ticks.min, xAxis.ticks.max, frame.x0, frame.x1);
  const sy = linearScale(yAxis.ticks.min, yAxis.ticks.max, frame.y1, frame.y0);
  const X = (rBohr: number): number => sx(rBohr * unit.perBohr * Math.pow(10, -xAxis.exponent));
  const Y = (hartree: number): number => sy(hartree * e * Math.pow(10, -yAxis.exponent));
  const clipBox = { x0: frame.x0, y0: frame.y0, x1: frame.x1, y1: frame.y1 };

  const nodes: SceneNode[] = axisNodes(frame, xAxis, yAxis, style, {
    xLabels: true,
    zeroLine: true,
  });
  const drawn: [number, number][] = [];
  const entries: LegendEntry[] = [];
  const curve = (f: (r: number) => number, stroke: Stroke, role: string): void => {
    const pts = rs.map((r) => [X(r), Y(f(r))] as [number, number]);
    for (const piece of clipPolyline(pts, clipBox)) {
      nodes.push({ type: 'path', commands: polylineCommands(piece), stroke, role });
      drawn.push(...piece);
    }
  };

  if (!kind.l.includes(0)) {
    const stroke: Stroke = { colour: style.ink, widthPt: style.lineWidthPt * 1.3, join: 'round' };
    curve((r) => potential.evaluate(r), stroke, 'potential');
    entries.push({ runs: [italic('V'), plain('('), italic('r'), plain(')')], stroke });
  }
  const centrifugal: Stroke = {
    colour: style.muted,
    widthPt: style.lineWidthPt * 0.8,
    dashPt: [1, 1.3],
  };
  kind.l.forEach((l, i) => {
    const stroke = strokeOf(i);
    curve(
      (r) => effectiveValue(potential, l, mu, r),
      stroke,
      l === 0 ? 'potential' : 'effective-potential',
    );
    entries.push({
      runs:
        l === 0
          ? [
              italic('V'),
              plain(' = '),
              italic('V'),
              sub('eff'),
              plain(', '),
              italic('l'),
              plain(' = 0'),
            ]
          : [italic('V'), sub('eff'), plain(', '), italic('l'), plain(` = ${l}`)],
      stroke,
    });
    if (kind.showCentrifugal && l > 0)
      curve(
        (r) => (l * (l + 1)) / (2 * mu * r * r),
        { ...centrifugal, colour: stroke.colour },
        'centrifugal',
      );
  });
  if (kind.showCentrifugal && kind.l.some((l) => l > 0))
    entries.push({
      runs: [
        italic('l'),
        plain('('),
        italic('l'),
        plain(' + 1)/(2'),
        italic('μr'),
        sup('2'),
        plain(')'),
      ],
      stroke: centrifugal,
    });
  if (wall !== undefined) {
    const x = X(wall);
    nodes.push(
      lineNode(
        x,
        frame.y0,
        x,
        frame.y1,
        { colour: style.ink, widthPt: style.lineWidthPt * 2 },
        'hard-wall',
      ),
    );
    drawn.push([x, frame.y0], [x, frame.y1]);
  }

  const hydrogenStroke: Stroke = {
    colour: style.muted,
    widthPt: style.lineWidthPt * 0.8,
    dashPt: [2.5, 1.5],
  };
  const hydrogenCharge = hydrogen[0]?.hydrogen?.Z;
  for (const lv of hydrogen) {
    const h = lv.hydrogen;
    if (!h) continue;
    // Turning points of −Z/r + l(l+1)/(2μr²) = E: E r² + Z r − l(l+1)/(2μ) = 0.
    const L = (lv.l * (lv.l + 1)) / mu;
    const root = Math.sqrt(Math.max(h.Z * h.Z + 2 * h.energy * L, 0));
    const inner = lv.l === 0 ? 0 : (-h.Z + root) / (2 * h.energy);
    const outer = (-h.Z - root) / (2 * h.energy);
    const y = Y(h.energy);
    if (y < frame.y0 || y > frame.y1) continue;
    const [xa, xb] = [Math.max(X(inner), frame.x0), Math.min(X(outer), frame.x1)];
    nodes.push(lineNode(xa, y, xb, y, hydrogenStroke, 'hydrogen-level'));
    drawn.push([xa, y], [xb, y]);
  }
  if (hydrogenCharge !== undefined)
    entries.push({
      runs: [plain(`hydrogen-like levels, Z = ${Number(hydrogenCharge.toPrecision(6))}`)],
      stroke: hydrogenStroke,
    });

  const placer = new LabelPlacer({
    x0: frame.x0 + 0.5,
    y0: frame.y0 - 1,
    x1: widthMm - 0.5,
    y1: frame.y1 - 0.3,
  });
  placer.avoidCurve(drawn);
  const key = legendInEmptiestCorner(entries, frame, style.smallSizePt, style.ink, drawn);
  placer.occupy(key.box);
  nodes.push(...key.nodes);

  const facts: SceneFact[] = [];
  const cap = capHeightMm(style.smallSizePt);
  const size = style.smallSizePt * 0.92;
  let unlabelled = 0;
  const levelNodes: SceneNode[] = [];
  for (const lv of levels) {
    const y = Y(lv.energy);
    const xa = Math.max(X(lv.inner), frame.x0);
    const xb = Math.min(X(lv.outer), frame.x1);
    if (!(y >= frame.y0 && y <= frame.y1) || !(xb > xa)) {
      unlabelled++;
      continue;
    }
    levelNodes.push(
      lineNode(
        xa,
        y,
        xb,
        y,
        { colour: lv.stroke.colour, widthPt: style.lineWidthPt * 1.1 },
        'level-line',
      ),
    );
    placer.avoidCurve([
      [xa, y],
      [xb, y],
    ]);
    const value = lv.energy * e;
    const printed = printedEnergy(lv.energy, lv.error, energyUnit);
    const runs: TextRun[] = [...shellRuns(lv.n, lv.l), plain(`: ${printed}`)];
    const beside = [
      text(xb + 1, y + cap / 2, runs, size, 'start', lv.stroke.colour, 'level-label'),
      text(xb - 0.5, y - 0.8, runs, size, 'end', lv.stroke.colour, 'level-label'),
      text(xa + 0.5, y - 0.8, runs, size, 'start', lv.stroke.colour, 'level-label'),
    ].find((c) => placer.fits(textBox(c)));
    if (beside) placer.occupy(textBox(beside));
    const near = beside
      ? { label: beside, leader: null }
      : placeNear(placer, [xb, y], cap, (lx, ly, anchor) =>
          text(lx, ly, runs, size, anchor, lv.stroke.colour, 'level-label'),
        );
    if (!near) {
      unlabelled++;
      continue;
    }
    if (near.leader) {
      const [[x1, y1], [x2, y2]] = near.leader;
      levelNodes.push(
        lineNode(
          x1,
          y1,
          x2,
          y2,
          { colour: style.muted, widthPt: style.axisWidthPt * 0.7 },
          'leader',
        ),
      );
    }
    levelNodes.push(near.label);
    facts.push({
      name: `${runsText(shellRuns(lv.n, lv.l))} energy`,
      value,
      unit: energyUnit.symbol,
      printed,
    });
  }
  nodes.push(...levelNodes);

  const allLevels = solved;
  const notes = [
    solverNote(allLevels, potential),
    'Each level is drawn between its classical turning points, where V_eff(r) = E.',
  ];
  const unbound = kind.l.filter((_, i) => solutions[i] === null);
  if (unbound.length) notes.push(`The potential binds no level with l = ${unbound.join(', ')}.`);
  for (const s of solutions)
    if (s && s.levels.length < kind.levels)
      notes.push(
        `The potential binds only ${s.levels.length} level${s.levels.length === 1 ? '' : 's'} with l = ${s.l}.`,
      );
  if (unlabelled > 0)
    notes.push(
      `${unlabelled} level${unlabelled === 1 ? ' is' : 's are'} not labelled where levels crowd or leave the plot; the alt text lists every energy.`,
    );
  const levelWords = allLevels
    .map(
      (lv) =>
        `${runsText(shellRuns(lv.n, lv.l))} at ${printedEnergy(lv.energy, lv.error, energyUnit)}`,
    )
    .join(', ');
  return sceneForSpec(spec, nodes, {
    title: `Effective potential of ${potential.label}, l = ${kind.l.join(', ')}`,
    altText: `V(r) = ${potential.formula.replace(/^V\(r\) = /, '')}, ${kind.showCentrifugal ? 'the centrifugal term l(l+1)/(2μr²) and ' : ''}V_eff for l = ${kind.l.join(', ')}, against r from 0 to ${formatSignificant(xEndBohr * unit.perBohr, 3)} ${unit.symbol}. Solved levels: ${levelWords}.`,
    facts,
    notes,
  });
}
