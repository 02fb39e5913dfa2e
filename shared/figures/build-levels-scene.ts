/**
 * Energy-level diagram: the levels n = 1 … nMax of a hydrogen-like ion (Z, reduced mass of the
 * chosen nucleus) on a linear energy scale, each labelled with its energy in eV, the ionisation
 * limit at 0 eV, and chosen transitions as downward (emission) arrows with a key listing each line's
 * series, vacuum wavelength and, above 200 nm, air wavelength.
 *
 * Physics: shared/physics/energy-levels (Bethe & Salpeter §2) and spectral-lines (Rydberg formula,
 * Peck & Reeder air index); CODATA 2022. Line names: α, β, γ … for n_upper − n_lower = 1, 2, 3 …
 * with the series prefixes Ly, H, Pa, Br, Pf, Hu (common practice in spectroscopy).
 */
import { energyLevels } from '../physics/energy-levels';
import { MAX_PRINCIPAL_QUANTUM_NUMBER } from '../physics/quantum-numbers';
import { spectralLine, type SpectralLine } from '../physics/spectral-lines';
import type { ResolvedFigureSpec } from '../spec/resolve-figure-spec';
import { FigureSpecError } from './figure-error';
import { sceneForSpec } from './scene-for-spec';
import { figureStyle, type FigureStyle } from './figure-style';
import { describeSystem, systemMassRatio } from './figure-system';
import { LabelPlacer, placeNear } from './label-placer';
import { formatSignificant } from './number-format';
import { text } from './plot-axes';
import {
  lineNode,
  polylineCommands,
  ptToMm,
  type FigureScene,
  type PathNode,
  type SceneFact,
  type SceneNode,
  type TextRun,
} from './scene';
import { capHeightMm, layoutRuns } from './text-layout';

type LevelsKind = Extract<ResolvedFigureSpec['kind'], { type: 'levels' }>;

const MARGIN_MM = 1.5;
const LABEL_GAP_MM = 1.2;
const KEY_GAP_MM = 3;
const ENERGY_DIGITS = 4;
const WAVELENGTH_DIGITS = 7;
const GREEK = 'αβγδεζηθικλμ';
const SERIES_PREFIX: Record<string, string> = {
  Lyman: 'Ly',
  Balmer: 'H',
  Paschen: 'Pa',
  Brackett: 'Br',
  Pfund: 'Pf',
  Humphreys: 'Hu',
};

const plain = (t: string): TextRun => ({ text: t, shift: 'base' });
const italic = (t: string): TextRun => ({ text: t, shift: 'base', italic: true });

/** "Hα", "Lyβ", … for hydrogen (Z = 1), else "7→3" (the series names are hydrogen's). */
export function lineName(line: Pick<SpectralLine, 'series' | 'nUpper' | 'nLower'>, Z = 1): string {
  const step = line.nUpper - line.nLower;
  if (Z !== 1 || line.series === null || step > GREEK.length)
    return `${line.nUpper}→${line.nLower}`;
  return `${SERIES_PREFIX[line.series]}${GREEK[step - 1]}`;
}

/**
 * Moves label baselines apart (at least `gap`) while keeping each group of crowded labels centred
 * on the levels it names (clusters merged until none overlap), never above `topBound`.
 */
export function spreadLabels(desired: readonly number[], gap: number, topBound: number): number[] {
  const order = desired.map((y, i) => ({ y, i })).sort((a, b) => a.y - b.y);
  type Cluster = { items: typeof order; top: number };
  const place = (items: typeof order): number => {
    const mean = items.reduce((sum, it, k) => sum + it.y - k * gap, 0) / items.length;
    return Math.max(topBound, mean);
  };
  let clusters: Cluster[] = order.map((it) => ({ items: [it], top: Math.max(topBound, it.y) }));
  let merged = true;
  while (merged) {
    merged = false;
    const next: Cluster[] = [];
    for (const c of clusters) {
      const last = next[next.length - 1];
      if (last && last.top + last.items.length * gap > c.top + 1e-9) {
        const items = [...last.items, ...c.items];
        next[next.length - 1] = { items, top: place(items) };
        merged = true;
      } else {
        next.push(c);
      }
    }
    clusters = next;
  }
  const placed = new Array<number>(desired.length);
  for (const c of clusters) c.items.forEach((it, k) => (placed[it.i] = c.top + k * gap));
  return placed;
}

function checkTransitions(kind: LevelsKind): void {
  kind.transitions.forEach((t, i) => {
    if (t.upper > MAX_PRINCIPAL_QUANTUM_NUMBER) {
      throw new FigureSpecError(
        `kind.transitions[${i}].upper`,
        `must be at most ${MAX_PRINCIPAL_QUANTUM_NUMBER}, got ${t.upper}`,
      );
    }
    if (t.upper <= t.lower)
      throw new FigureSpecError(
        `kind.transitions[${i}].upper`,
        `must be greater than lower = ${t.lower}, got ${t.upper}`,
      );
  });
}

interface KeyRow {
  runs: TextRun[];
  sizePt: number;
  colour: string;
  role: string;
}

function arrow(
  x: number,
  yFrom: number,
  yTo: number,
  colour: string,
  style: FigureStyle,
): PathNode[] {
  const head = 1.3;
  const half = 0.55;
  return [
    {
      type: 'path',
      commands: polylineCommands([
        [x, yFrom],
        [x, yTo - head * 0.8],
      ]),
      stroke: { colour, widthPt: style.lineWidthPt * 1.2 },
      role: 'transition-arrow',
    },
    {
      type: 'path',
      commands: polylineCommands(
        [
          [x - half, yTo - head],
          [x, yTo],
          [x + half, yTo - head],
        ],
        true,
      ),
      fill: { colour },
      role: 'transition-head',
    },
  ];
}

export function buildLevelsScene(spec: ResolvedFigureSpec): FigureScene {
  if (spec.kind.type !== 'levels')
    throw new FigureSpecError('kind.type', `expected "levels", got "${spec.kind.type}"`);
  const kind = spec.kind;
  checkTransitions(kind);
  const style = figureStyle(spec);
  const Z = spec.system.Z;
  const mu = systemMassRatio(spec);
  const transitions = [...kind.transitions].sort((a, b) => a.lower - b.lower || a.upper - b.upper);
  const lines = transitions.map((t) => spectralLine(t.upper, t.lower, Z, mu));
  const top = Math.max(kind.nMax, ...transitions.map((t) => t.upper));
  const shown = new Set<number>(Array.from({ length: kind.nMax }, (_, i) => i + 1));
  for (const t of transitions) shown.add(t.upper).add(t.lower);
  const levels = energyLevels(top, Z, mu).filter((lv) => shown.has(lv.n));
  const facts: SceneFact[] = [];

  // Key rows: per series a heading, per line its name and wavelengths.
  const keySize = style.smallSizePt;
  const keyRows: KeyRow[] = [];
  let lastLower: number | undefined;
  lines.forEach((line, i) => {
    const series = Z === 1 ? line.series : null;
    if (line.nLower !== lastLower) {
      keyRows.push({
        runs: [
          {
            text: series ? `${series} series` : `Lines to n = ${line.nLower}`,
            shift: 'base',
            weight: 600,
          },
        ],
        sizePt: keySize,
        colour: style.ink,
        role: 'key-series',
      });
      lastLower = line.nLower;
    }
    const name = lineName(line, Z);
    const vac = `${formatSignificant(line.vacuumNm, WAVELENGTH_DIGITS)} nm`;
    keyRows.push({
      runs: name.includes('→')
        ? [plain(`${name}  `), plain(vac)]
        : [plain(`${name}  `), plain(`${line.nUpper}→${line.nLower}  `), plain(vac)],
      sizePt: keySize,
      colour: style.curveColours[i % 2 === 0 ? 0 : 1],
      role: 'key-line',
    });
    facts.push({
      name: `${series ? `${series} ` : ''}${name} vacuum wavelength`,
      value: line.vacuumNm,
      unit: 'nm',
      printed: vac,
    });
    if (line.airNm !== null) {
      const air = `${formatSignificant(line.airNm, WAVELENGTH_DIGITS)} nm`;
      keyRows.push({
        runs: [plain(`in air ${air}`)],
        sizePt: keySize * 0.92,
        colour: style.muted,
        role: 'key-air',
      });
      facts.push({
        name: `${series ? `${series} ` : ''}${name} air wavelength`,
        value: line.airNm,
        unit: 'nm',
        printed: air,
      });
    }
  });
  const rowHeight = ptToMm(keySize) * 1.3;
  const keyWidth =
    keyRows.length === 0
      ? 0
      : Math.max(...keyRows.map((r) => layoutRuns(r.runs, r.sizePt, 'start').widthMm));

  // Level labels "n = 3, −1.512 eV" to the right of the lines.
  const labelSize = style.smallSizePt;
  const levelRuns = levels.map((lv): TextRun[] => {
    const printed = `${formatSignificant(lv.eV, ENERGY_DIGITS)} eV`;
    facts.push({ name: `level n = ${lv.n} energy`, value: lv.eV, unit: 'eV', printed });
    return [italic('n'), plain(` = ${lv.n}, ${printed}`)];
  });
  const limitRuns: TextRun[] = [italic('n'), plain(' = ∞, 0 eV')];
  const labelWidth = Math.max(
    ...[...levelRuns, limitRuns].map((r) => layoutRuns(r, labelSize, 'start').widthMm),
  );

  const { widthMm, heightMm } = spec.print;
  const keyBeside =
    keyRows.length > 0 &&
    widthMm - 2 * MARGIN_MM - labelWidth - LABEL_GAP_MM - KEY_GAP_MM - keyWidth >= 22;
  const keyBelowHeight =
    keyRows.length > 0 && !keyBeside ? keyRows.length * rowHeight + KEY_GAP_MM : 0;
  const x0 = MARGIN_MM;
  const x1 =
    widthMm - MARGIN_MM - labelWidth - LABEL_GAP_MM - (keyBeside ? KEY_GAP_MM + keyWidth : 0);
  const cap = capHeightMm(labelSize);
  const yTop = MARGIN_MM + cap + 1.5;
  const yBottom = heightMm - MARGIN_MM - keyBelowHeight - 1;
  if (x1 - x0 < 15 || yBottom - yTop < 20)
    throw new FigureSpecError(
      'print',
      `${widthMm} × ${heightMm} mm is too small for this level diagram`,
    );
  const eLow = levels[0].eV;
  const yOf = (eV: number): number => yTop + ((0 - eV) / (0 - eLow)) * (yBottom - yTop);

  const nodes: SceneNode[] = [];
  const levelStroke = { colour: style.ink, widthPt: style.lineWidthPt * 1.3 };
  nodes.push(
    lineNode(
      x0,
      yTop,
      x1,
      yTop,
      { colour: style.muted, widthPt: style.lineWidthPt, dashPt: [2.5, 1.5] },
      'ionisation-limit',
    ),
  );
  for (const lv of levels)
    nodes.push(lineNode(x0, yOf(lv.eV), x1, yOf(lv.eV), levelStroke, 'level'));

  // Labels: spread apart where levels crowd towards the limit, with a leader back to the level.
  const desired = [yTop, ...levels.map((lv) => yOf(lv.eV))].map((y) => y + cap / 2);
  const spread = spreadLabels(desired, ptToMm(labelSize) * 1.15, MARGIN_MM + cap);
  const allRuns = [limitRuns, ...levelRuns];
  spread.forEach((y, i) => {
    const lx = x1 + LABEL_GAP_MM;
    if (Math.abs(y - desired[i]) > 0.05) {
      nodes.push({
        type: 'path',
        commands: polylineCommands([
          [x1, desired[i] - cap / 2],
          [lx - 0.3, y - cap / 2],
        ]),
        stroke: { colour: style.faint, widthPt: style.axisWidthPt * 0.7 },
        role: 'leader',
      });
    }
    nodes.push(
      text(
        lx + 0.2,
        y,
        allRuns[i],
        labelSize,
        'start',
        i === 0 ? style.muted : style.ink,
        i === 0 ? 'limit-label' : 'level-label',
      ),
    );
  });

  // Arrows, grouped by series from left to right, with their names beside them.
  const placer = new LabelPlacer({ x0, y0: yTop - 1, x1, y1: yBottom + 3 });
  const groups = new Set(lines.map((l) => l.nLower)).size;
  const slots = lines.length + Math.max(0, groups - 1) * 0.6;
  const pitch = (x1 - x0) / (slots + 1);
  let slot = 0.5;
  let previousLower = lines[0]?.nLower;
  const arrows: { x: number; line: SpectralLine; colour: string }[] = [];
  lines.forEach((line, i) => {
    if (line.nLower !== previousLower) slot += 0.6;
    previousLower = line.nLower;
    slot += 1;
    const x = x0 + slot * pitch;
    const colour = style.curveColours[i % 2 === 0 ? 0 : 1];
    const yUp = yOf(levels.find((lv) => lv.n === line.nUpper)?.eV ?? 0);
    const yLow = yOf(levels.find((lv) => lv.n === line.nLower)?.eV ?? 0);
    const parts = arrow(x, yUp, yLow, colour, style);
    nodes.push(...parts);
    placer.avoidCurve([
      [x, yUp],
      [x, yLow],
    ]);
    arrows.push({ x, line, colour });
  });
  for (const { x, line, colour } of arrows) {
    const yUp = yOf(levels.find((lv) => lv.n === line.nUpper)?.eV ?? 0);
    const yLow = yOf(levels.find((lv) => lv.n === line.nLower)?.eV ?? 0);
    const placed = placeNear(
      placer,
      [x, (yUp + yLow) / 2],
      capHeightMm(labelSize),
      (lx, ly, anchor) =>
        text(lx, ly, [plain(lineName(line, Z))], labelSize, anchor, colour, 'transition-label'),
    );
    if (placed) nodes.push(placed.label);
  }

  // The key, beside the diagram when there is room, else below it.
  const kx = keyBeside ? widthMm - MARGIN_MM - keyWidth : MARGIN_MM;
  let ky = keyBeside
    ? yTop + capHeightMm(keySize)
    : yBottom + KEY_GAP_MM + capHeightMm(keySize) + 1;
  for (const row of keyRows) {
    if (row.role === 'key-series' && ky > yTop + capHeightMm(keySize) + 0.1) ky += rowHeight * 0.35;
    nodes.push(text(kx, ky, row.runs, row.sizePt, 'start', row.colour, row.role));
    ky += rowHeight;
  }

  const system = describeSystem(spec);
  const notes = [
    'Non-relativistic levels (no fine structure, Lamb shift or hyperfine structure): measured lines differ by up to about 3 × 10⁻⁵ of the wavelength.',
  ];
  if (lines.some((l) => l.airNm === null))
    notes.push(
      'No air wavelength is given below 200 nm, where the air-index formula does not apply.',
    );
  return sceneForSpec(spec, nodes, {
    title: `Energy levels n = 1 … ${kind.nMax} (${system})`,
    altText: `Energy-level diagram of ${system}: levels ${levels.map((lv) => `n = ${lv.n} at ${formatSignificant(lv.eV, ENERGY_DIGITS)} eV`).join(', ')}; ionisation limit at 0 eV.${lines.length ? ` Transitions: ${lines.map((l) => `${lineName(l, Z)} (${l.nUpper} → ${l.nLower}) at ${formatSignificant(l.vacuumNm, WAVELENGTH_DIGITS)} nm in vacuum${l.airNm !== null ? `, ${formatSignificant(l.airNm, WAVELENGTH_DIGITS)} nm in air` : ''}`).join('; ')}.` : ''}`,
    facts,
    notes,
  });
}
