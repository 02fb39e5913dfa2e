/**
 * Level diagram comparing a central potential's solved levels with hydrogen's: one column per
 * l = 0 … lMax holding that l's solved levels n = l + 1 … nMax (those the potential binds) as solid
 * bars, and hydrogen's levels n = 1 … nMax (charge of the potential's Coulomb tail, or of its
 * nucleus) as dashed lines across every column, since hydrogen's do not depend on l. Screening
 * shows as the l-splitting: 2s below 2p, 3s below 3p below 3d.
 *
 * Physics: shared/solver (Numerov shooting, see solved-potential.ts); hydrogen E_n = −μZ²/(2n²)
 * (shared/physics/energy-levels, Bethe & Salpeter §2). Energies in hartree with bohr, eV with pm or Å,
 * each printed with the digits its estimated error allows (at most six).
 */
import { energyValue } from '../physics/energy-levels';
import { angularMomentumLetter } from '../physics/orbital-labels';
import type { SolvedLevel } from '../solver/solve-radial';
import type { ResolvedFigureSpec } from '../spec/resolve-figure-spec';
import { spreadLabels } from './build-levels-scene';
import { FigureSpecError } from './figure-error';
import { figureStyle } from './figure-style';
import { systemMassRatio } from './figure-system';
import { legend } from './legend';
import { lengthUnit } from './length-units';
import { axisNodes, makeAxis, linearScale, text, yAxisWidthMm, type Frame } from './plot-axes';
import {
  lineNode,
  polylineCommands,
  ptToMm,
  type FigureScene,
  type SceneFact,
  type SceneNode,
  type TextRun,
} from './scene';
import { sceneForSpec } from './scene-for-spec';
import {
  energyUnitFor,
  MAX_ENERGY_DIGITS,
  printedEnergy,
  solvePotential,
  solverNote,
} from './solved-potential';
import { capHeightMm, layoutRuns } from './text-layout';

const MARGIN_MM = 1.5;
/** lMax when the spec leaves it unset. */
export const DEFAULT_COMPARE_L_MAX = 2;
/** Share of a column the solved bars take; their labels use the rest. */
const BAR_SHARE = 0.25;
/** Page width per column below which energies print with NARROW_DIGITS significant digits. */
const WIDE_COLUMN_PAGE_MM = 38;
const NARROW_DIGITS = 4;
/** Narrowest column of solved levels. */
const MIN_COLUMN_MM = 14;
/** Levels deeper than this many times the next scale (hydrogen's 1s, or the valence levels) sit below a cut. */
const CORE_DEPTH = 2.5;

const plain = (t: string): TextRun => ({ text: t, shift: 'base' });
const italic = (t: string): TextRun => ({ text: t, shift: 'base', italic: true });

export function buildSolvedLevelsScene(spec: ResolvedFigureSpec): FigureScene {
  if (spec.kind.type !== 'levels' || spec.kind.potential === undefined)
    throw new FigureSpecError(
      'kind.potential',
      'a comparison with solved levels needs the potential',
    );
  const kind = spec.kind;
  const potentialSpec = spec.kind.potential;
  const lMax = Math.min(kind.lMax ?? DEFAULT_COMPARE_L_MAX, kind.nMax - 1);
  const ls = Array.from({ length: lMax + 1 }, (_, l) => l);
  const style = figureStyle(spec);
  const unit = lengthUnit(spec.system.lengthUnit);
  const energyUnit = energyUnitFor(unit);
  const e = energyUnit.perHartree;
  const mu = systemMassRatio(spec);
  const { potential, solutions } = solvePotential(
    potentialSpec,
    ls.map((l) => ({ l, levels: kind.nMax - l, clamp: true })),
    mu,
    { potential: 'kind.potential', l: () => 'kind.lMax', levels: () => 'kind.nMax' },
  );
  const solved: SolvedLevel[] = solutions.flatMap((s) => s?.levels ?? []);
  const { tailCharge, originCharge } = potential.asymptotes;
  const zHydrogen = tailCharge > 0 ? tailCharge : originCharge;
  const hydrogen =
    zHydrogen > 0
      ? Array.from({ length: kind.nMax }, (_, i) => ({
          n: i + 1,
          energy: energyValue(i + 1, mu * zHydrogen * zHydrogen),
        }))
      : [];
  if (solved.length === 0 && hydrogen.length === 0)
    throw new FigureSpecError(
      'kind.potential',
      'binds no level with l ≤ lMax and has no hydrogen-like charge to compare with',
    );

  // Narrow columns (the default 84 mm square holds three) print four digits, so labels fit.
  const narrow = spec.print.widthMm / ls.length < WIDE_COLUMN_PAGE_MM;
  const printedOf = (hartree: number, error: number): string =>
    printedEnergy(hartree, error, energyUnit, narrow ? NARROW_DIGITS : MAX_ENERGY_DIGITS);
  const all = [...solved.map((lv) => lv.energy), ...hydrogen.map((h) => h.energy)];
  const threshold = Number.isFinite(potential.asymptotes.threshold)
    ? potential.asymptotes.threshold
    : Math.max(...all);
  // Deep core levels would squash the valence levels whose splitting the figure is about: they are
  // listed at the bottom of their column instead, below a cut of the axis.
  const valence = [
    ...solved.filter((lv) => lv.n > 1).map((lv) => lv.energy),
    ...hydrogen.map((h) => h.energy),
  ];
  const floor =
    valence.length && Number.isFinite(potential.asymptotes.threshold)
      ? threshold - CORE_DEPTH * (threshold - Math.min(...valence))
      : -Infinity;
  const low = Math.min(...all.filter((v) => v >= floor));
  const high = Math.max(threshold, ...all);
  const span = Math.max(high - low, 1e-12);
  const yAxis = makeAxis(
    (low - 0.04 * span) * e,
    (high + 0.04 * span) * e,
    [italic('E')],
    [plain(energyUnit.symbol)],
  );

  const { widthMm, heightMm } = spec.print;
  const labelSize = style.smallSizePt;
  const cap = capHeightMm(labelSize);
  const hydrogenRuns = hydrogen.map((h): TextRun[] => [
    italic('n'),
    // The unit is on the axis; the label keeps the number.
    plain(` = ${h.n}: ${printedOf(h.energy, 0).split(' ')[0]}`),
  ]);
  const hydrogenWidth = Math.max(
    0,
    ...hydrogenRuns.map((r) => layoutRuns(r, labelSize, 'start').widthMm),
  );
  const frame: Frame = {
    x0: MARGIN_MM + yAxisWidthMm(yAxis, style),
    y0: MARGIN_MM + cap + 1,
    x1: widthMm - MARGIN_MM - hydrogenWidth - 5,
    y1: heightMm - MARGIN_MM - 2 * ptToMm(style.fontSizePt) - 2,
  };
  if (frame.x1 - frame.x0 < MIN_COLUMN_MM * ls.length || frame.y1 - frame.y0 < 25)
    throw new FigureSpecError(
      'print',
      `${widthMm} × ${heightMm} mm is too small for ${ls.length} columns of levels`,
    );
  const sy = linearScale(yAxis.ticks.min, yAxis.ticks.max, frame.y1, frame.y0);
  const Y = (hartree: number): number => sy(hartree * e * Math.pow(10, -yAxis.exponent));
  const xAxis = {
    ...makeAxis(0, 1, [], []),
    ticks: { min: 0, max: 1, step: 1, values: [], decimals: 0 },
  };
  const nodes: SceneNode[] = axisNodes(frame, xAxis, yAxis, style, {
    xLabels: false,
    zeroLine: true,
  });
  const facts: SceneFact[] = [];

  // Hydrogen's levels: dashed beside each column's bars (clear of the solved labels) and at the
  // right edge, where they are labelled (spread where they crowd).
  const columnWidth = (frame.x1 - frame.x0) / ls.length;
  const barStart = (col: number): number => frame.x0 + col * columnWidth + 0.06 * columnWidth;
  const barEnd = (col: number): number => barStart(col) + BAR_SHARE * columnWidth;
  const hydrogenStroke = { colour: style.muted, widthPt: style.lineWidthPt, dashPt: [2.5, 1.5] };
  // Label baselines for levels at page heights ys, pushed apart where they crowd.
  const spreadAt = (ys: number[]): number[] =>
    spreadLabels(
      ys.map((y) => y + cap / 2),
      ptToMm(labelSize) * 1.15,
      frame.y0,
    );
  const hydrogenY = hydrogen.map((h) => Y(h.energy));
  const spreadH = spreadAt(hydrogenY);
  hydrogen.forEach((h, i) => {
    for (const col of ls.keys())
      nodes.push(
        lineNode(
          barStart(col) - 1.5,
          hydrogenY[i],
          barEnd(col) + 0.5,
          hydrogenY[i],
          hydrogenStroke,
          'hydrogen-level',
        ),
      );
    nodes.push(
      lineNode(
        frame.x1 + 0.5,
        hydrogenY[i],
        frame.x1 + 3.3,
        hydrogenY[i],
        hydrogenStroke,
        'hydrogen-level',
      ),
    );
    const printed = printedOf(h.energy, 0);
    facts.push({
      name: `n = ${h.n} (hydrogen) energy`,
      value: h.energy * e,
      unit: energyUnit.symbol,
      printed,
    });
    if (Math.abs(spreadH[i] - cap / 2 - hydrogenY[i]) > 0.05)
      nodes.push(
        lineNode(
          frame.x1 + 3.3,
          hydrogenY[i],
          frame.x1 + 4.5,
          spreadH[i] - cap / 2,
          { colour: style.faint, widthPt: style.axisWidthPt * 0.7 },
          'leader',
        ),
      );
    nodes.push(
      text(
        frame.x1 + 4.8,
        spreadH[i],
        hydrogenRuns[i],
        labelSize,
        'start',
        style.muted,
        'hydrogen-label',
      ),
    );
  });

  // Solved levels: a bar per level in its l column, the label beside it.
  const deep: string[] = [];
  ls.forEach((l, col) => {
    const colour = style.curveColours[col % style.curveColours.length];
    const xa = barStart(col);
    const xb = barEnd(col);
    const everyLevel = solutions[col]?.levels ?? [];
    everyLevel
      .filter((lv) => lv.energy < floor)
      .forEach((lv, i) => {
        const name = `${lv.n}${angularMomentumLetter(lv.l)}`;
        const printed = printedOf(lv.energy, lv.error);
        facts.push({
          name: `${name} (solved) energy`,
          value: lv.energy * e,
          unit: energyUnit.symbol,
          printed,
        });
        deep.push(`${name} at ${printed}`);
        const y = frame.y1 - 1 - i * ptToMm(labelSize) * 1.2;
        nodes.push(
          text(
            xa,
            y,
            [plain(`↓ ${name} ${printed.split(' ')[0]}`)],
            labelSize * 0.85,
            'start',
            colour,
            'solved-label',
          ),
        );
      });
    const levels = everyLevel.filter((lv) => lv.energy >= floor);
    const ys = levels.map((lv) => Y(lv.energy));
    const spread = spreadAt(ys);
    levels.forEach((lv, i) => {
      nodes.push(
        lineNode(
          xa,
          ys[i],
          xb,
          ys[i],
          { colour, widthPt: style.lineWidthPt * 1.6 },
          'solved-level',
        ),
      );
      const name = `${lv.n}${angularMomentumLetter(lv.l)}`;
      const printed = printedOf(lv.energy, lv.error);
      facts.push({
        name: `${name} (solved) energy`,
        value: lv.energy * e,
        unit: energyUnit.symbol,
        printed,
      });
      if (Math.abs(spread[i] - cap / 2 - ys[i]) > 0.05)
        nodes.push({
          type: 'path',
          commands: polylineCommands([
            [xb, ys[i]],
            [xb + 0.8, spread[i] - cap / 2],
          ]),
          stroke: { colour: style.faint, widthPt: style.axisWidthPt * 0.7 },
          role: 'leader',
        });
      nodes.push(
        text(
          xb + 1.2,
          spread[i],
          [plain(`${name} ${printed.split(' ')[0]}`)],
          labelSize * 0.85,
          'start',
          colour,
          'solved-label',
        ),
      );
    });
    const heading: TextRun[] = [italic('l'), plain(` = ${l} (${angularMomentumLetter(l)})`)];
    nodes.push(
      text(
        frame.x0 + (col + 0.5) * columnWidth,
        frame.y1 + ptToMm(style.fontSizePt) * 1.2,
        heading,
        labelSize,
        'middle',
        style.ink,
        'column-heading',
      ),
    );
  });
  const key = legend(
    [
      { runs: [plain('solved')], stroke: { colour: style.ink, widthPt: style.lineWidthPt * 1.6 } },
      {
        runs: [plain(`hydrogen-like, Z = ${Number(zHydrogen.toPrecision(6))}`)],
        stroke: hydrogenStroke,
      },
    ],
    { ...frame, y0: frame.y1 - ptToMm(labelSize) * 3.2 - 2 },
    labelSize,
    style.ink,
    'top-right',
  );
  if (hydrogen.length) nodes.push(...key.nodes);

  const unbound = ls.filter((l) => (solutions[l]?.levels.length ?? 0) < kind.nMax - l);
  const notes = [solverNote(solved, potential)];
  if (unbound.length)
    notes.push(
      `The potential binds fewer levels than hydrogen up to n = ${kind.nMax} for l = ${unbound.join(', ')}; only the bound ones are drawn.`,
    );
  notes.push(
    `Solved labels print the energy in ${energyUnit.symbol}; hydrogen's levels are exact.`,
  );
  if (deep.length)
    notes.push(
      `Below the plotted range (marked ↓ at the foot of their column): ${deep.join(', ')}.`,
    );
  const solvedWords = solved
    .map((lv) => `${lv.n}${angularMomentumLetter(lv.l)} at ${printedOf(lv.energy, lv.error)}`)
    .join(', ');
  return sceneForSpec(spec, nodes, {
    title: `Levels of ${potential.label}, solved for l = 0 … ${lMax}, beside hydrogen's`,
    altText: `Energy levels of ${potential.label} (${potential.formula}) solved numerically for l = 0 to ${lMax}: ${solvedWords}.${hydrogen.length ? ` Hydrogen-like levels for Z = ${Number(zHydrogen.toPrecision(6))}: ${hydrogen.map((h) => `n = ${h.n} at ${printedOf(h.energy, 0)}`).join(', ')}.` : ''}`,
    facts,
    notes,
  });
}
