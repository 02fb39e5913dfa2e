/**
 * Slice figure: signed ψ (diverging colours, white at zero) or the density |ψ|² (sequential) in a
 * plane through the nucleus, as a colour field embedded at the print dpi, contour lines as vector
 * paths, a colour bar with units, axes in the length unit and the plane named.
 *
 * Values: shared/grid/slice (sampleSlice, kind.resolution samples a side) and shared/grid contours
 * (d3-contour). The colour field is that sampling interpolated bilinearly to the raster's pixels.
 * Contour levels: by enclosed fraction, the levels whose 3D surfaces enclose those fractions
 * (sliceContoursEnclosing, the same definition as isosurface figures), or explicit levels in atomic
 * units (ψ in bohr^−3/2, |ψ|² in bohr^−3). kind.extent is the half-width in bohr.
 */
import { compileState, type CompiledState } from '../physics/orbital-state';
import { suggestedExtent } from '../physics/sample-state-on-grid';
import { sampleSlice, type Slice } from '../grid/slice';
import { sliceContours, type ContourLevel } from '../grid/slice-contours';
import { sliceContoursEnclosing } from '../grid/slice-contours-enclosing';
import type { ResolvedFigureSpec } from '../spec/resolve-figure-spec';
import { divergingScale, scaleStrip, sequentialScale, type ColourScale } from './colour-scale';
import { FigureSpecError } from './figure-error';
import { sceneForSpec } from './scene-for-spec';
import { figureStyle, type FigureStyle } from './figure-style';
import { describeSystem, orbitalStateOf } from './figure-system';
import { stateLabelRuns } from './label-runs';
import { LabelPlacer, placeNear } from './label-placer';
import { lengthUnit } from './length-units';
import { formatSignificant } from './number-format';
import {
  axisNodes,
  axisTitleRuns,
  linearScale,
  makeAxis,
  text,
  tickLabel,
  xAxisHeightMm,
  yAxisWidthMm,
  type AxisDef,
  type Frame,
} from './plot-axes';
import {
  lineNode,
  polylineCommands,
  runsText,
  type FigureScene,
  type ImageNode,
  type SceneFact,
  type SceneNode,
  type TextRun,
} from './scene';
import { capHeightMm, layoutRuns } from './text-layout';

type SliceKind = Extract<ResolvedFigureSpec['kind'], { type: 'slice' }>;

/** Points per axis of the 3D grid behind enclosed-fraction contour levels. */
export const CONTOUR_LEVEL_GRID = 64;
const MARGIN_MM = 1.2;
const BAR_GAP_MM = 3;
const BAR_WIDTH_MM = 3;
const BAR_STRIP = { width: 8, height: 512 };

const italic = (t: string): TextRun => ({ text: t, shift: 'base', italic: true });
const plain = (t: string): TextRun => ({ text: t, shift: 'base' });
const sup = (t: string): TextRun => ({ text: t, shift: 'sup' });

interface PlaneInfo {
  name: string;
  uTitle: TextRun[];
  vTitle: TextRun[];
}

function planeInfo(plane: SliceKind['plane'], slice: Slice): PlaneInfo {
  if (typeof plane === 'string') {
    return { name: `${plane}-plane`, uTitle: [italic(plane[0])], vTitle: [italic(plane[1])] };
  }
  const f = (v: readonly number[]): string =>
    `(${v.map((x) => formatSignificant(x, 2)).join(', ')})`;
  return {
    name: `plane with normal ${f(slice.axes.normal)}`,
    uTitle: [italic('u'), plain(` along ${f(slice.axes.u)}`)],
    vTitle: [italic('v'), plain(` along ${f(slice.axes.v)}`)],
  };
}

/**
 * Bilinear interpolation of the sampled values to a square raster of `pixels` a side, top row first.
 * Where the time goes: one multiply-add chain and a table look-up per pixel (≈ 4 M pixels at
 * 600 dpi for a large figure); the column weights are computed once.
 */
function colourField(
  slice: Slice,
  values: Float32Array,
  scale: ColourScale,
  pixels: number,
): Uint8Array {
  const { width: n } = slice;
  const rgba = new Uint8Array(pixels * pixels * 4);
  const perPixel = (n - 1) / pixels;
  const column = new Int32Array(pixels);
  const columnWeight = new Float64Array(pixels);
  for (let px = 0; px < pixels; px++) {
    const fi = (px + 0.5) * perPixel;
    column[px] = Math.min(n - 2, Math.floor(fi));
    columnWeight[px] = fi - column[px];
  }
  const { lut, lo, hi } = scale;
  const k = 255 / (hi - lo);
  for (let py = 0; py < pixels; py++) {
    // Pixel centre at fraction (py + 0.5)/pixels from the top; sample row j counts from the bottom.
    const fj = n - 1 - (py + 0.5) * perPixel;
    const j0 = Math.min(n - 2, Math.max(0, Math.floor(fj)));
    const ty = fj - j0;
    const row0 = n * j0;
    const row1 = row0 + n;
    let o = 4 * py * pixels;
    for (let px = 0; px < pixels; px++, o += 4) {
      const i0 = column[px];
      const tx = columnWeight[px];
      const a = values[row0 + i0];
      const c = values[row1 + i0];
      const top = a + (values[row0 + i0 + 1] - a) * tx;
      const bottom = c + (values[row1 + i0 + 1] - c) * tx;
      let e = Math.round((top + (bottom - top) * ty - lo) * k);
      e = e < 0 ? 0 : e > 255 ? 255 : e;
      rgba[o] = lut[3 * e];
      rgba[o + 1] = lut[3 * e + 1];
      rgba[o + 2] = lut[3 * e + 2];
      rgba[o + 3] = 255;
    }
  }
  return rgba;
}

interface Levels {
  contours: ContourLevel[];
  /** Label per contour level (e.g. "90 %"), or null. */
  labels: (string | null)[];
  note: string;
}

function contourLevels(c: CompiledState, slice: Slice, kind: SliceKind): Levels {
  const q = kind.quantity;
  if (kind.contours.mode === 'levels') {
    const levels = kind.contours.levels;
    if (q === 'density')
      levels.forEach((v, i) => {
        if (!(v > 0))
          throw new FigureSpecError(
            `kind.contours.levels[${i}]`,
            'a density level must be positive (bohr⁻³)',
          );
      });
    return {
      contours: sliceContours(slice, q, levels),
      labels: levels.map(() => null),
      note: `Contours are drawn at chosen ${q === 'psi' ? 'values of ψ (bohr^−3/2)' : 'densities (bohr^−3)'}; a contour at an arbitrary level does not enclose any stated probability.`,
    };
  }
  const fractions = kind.contours.fractions;
  if (fractions.length === 0) return { contours: [], labels: [], note: '' };
  const result = sliceContoursEnclosing(c, slice, q, fractions, { n: CONTOUR_LEVEL_GRID });
  const percent = (f: number): string => `${Number((f * 100).toFixed(1))} %`;
  const labels =
    q === 'density' ? fractions.map(percent) : fractions.flatMap((f) => [percent(f), null]);
  const enclosed = result.levels
    .map((l) => `${percent(l.fraction)} (grid: ${formatSignificant(l.enclosed * 100, 4)} %)`)
    .join(', ');
  return {
    contours: result.contours,
    labels,
    note: `Contours are the sections of the 3D surfaces enclosing ${enclosed} of the probability (levels from a ${CONTOUR_LEVEL_GRID}³ grid); within this plane they do not enclose those fractions.`,
  };
}

/** Colour bar beside the image: the scale as a raster strip, ticks, contour marks and a rotated title. */
function colourBar(
  scale: ColourScale,
  axis: AxisDef,
  x: number,
  y0: number,
  y1: number,
  marks: { value: number; dashed: boolean }[],
  style: FigureStyle,
): SceneNode[] {
  const nodes: SceneNode[] = [
    {
      type: 'image',
      x,
      y: y0,
      width: BAR_WIDTH_MM,
      height: y1 - y0,
      pixelWidth: BAR_STRIP.width,
      pixelHeight: BAR_STRIP.height,
      rgba: scaleStrip(scale, BAR_STRIP.width, BAR_STRIP.height),
      role: 'colour-bar',
    },
  ];
  const f = Math.pow(10, -axis.exponent);
  const sy = linearScale(axis.ticks.min, axis.ticks.max, y1, y0);
  const stroke = { colour: style.ink, widthPt: style.axisWidthPt };
  nodes.push({
    type: 'path',
    commands: polylineCommands(
      [
        [x, y0],
        [x + BAR_WIDTH_MM, y0],
        [x + BAR_WIDTH_MM, y1],
        [x, y1],
      ],
      true,
    ),
    stroke,
    role: 'colour-bar-frame',
  });
  const cap = capHeightMm(style.smallSizePt);
  let widest = 0;
  for (const v of axis.ticks.values) {
    const y = sy(v);
    nodes.push(
      lineNode(
        x + BAR_WIDTH_MM,
        y,
        x + BAR_WIDTH_MM + style.tickLengthMm,
        y,
        stroke,
        'colour-bar-tick',
      ),
    );
    const label = tickLabel(axis, v);
    widest = Math.max(widest, layoutRuns([plain(label)], style.smallSizePt, 'start').widthMm);
    nodes.push(
      text(
        x + BAR_WIDTH_MM + style.tickLengthMm + 0.8,
        y + cap / 2,
        [plain(label)],
        style.smallSizePt,
        'start',
        style.ink,
        'colour-bar-label',
      ),
    );
  }
  for (const m of marks) {
    const y = sy(m.value * f);
    nodes.push(
      lineNode(
        x,
        y,
        x + BAR_WIDTH_MM,
        y,
        { colour: style.ink, widthPt: style.lineWidthPt, dashPt: m.dashed ? [1, 0.8] : undefined },
        'colour-bar-contour-mark',
      ),
    );
  }
  const title = text(
    x + BAR_WIDTH_MM + style.tickLengthMm + 0.8 + widest + 1.8 + capHeightMm(style.fontSizePt),
    (y0 + y1) / 2,
    axisTitleRuns(axis),
    style.fontSizePt,
    'middle',
    style.ink,
    'colour-bar-title',
  );
  title.rotationDeg = -90;
  nodes.push(title);
  return nodes;
}

export function buildSliceScene(spec: ResolvedFigureSpec): FigureScene {
  if (spec.kind.type !== 'slice')
    throw new FigureSpecError('kind.type', `expected "slice", got "${spec.kind.type}"`);
  const kind = spec.kind;
  const style = figureStyle(spec);
  const unit = lengthUnit(spec.system.lengthUnit);
  const c = compileState(orbitalStateOf(spec));
  if (kind.quantity === 'psi' && !c.isReal) {
    throw new FigureSpecError(
      'kind.quantity',
      'ψ of this state is complex (complex weights or time evolution); choose "density"',
    );
  }
  const half = kind.extent ?? suggestedExtent(c);
  const slice = sampleSlice(c, {
    plane: kind.plane,
    width: kind.resolution,
    height: kind.resolution,
    halfWidth: half,
  });
  const values =
    kind.quantity === 'psi'
      ? slice.re
      : slice.re.map((a, s) => a * a + (slice.im ? slice.im[s] * slice.im[s] : 0));
  let max = 0;
  for (const v of values) max = Math.max(max, Math.abs(v));
  if (!(max > 0))
    throw new FigureSpecError(
      'kind.plane',
      'the state vanishes everywhere in this plane (a nodal plane); choose another plane',
    );
  const scale =
    kind.quantity === 'psi'
      ? divergingScale(max, style.positive, style.negative)
      : sequentialScale(max, style.positive);
  const plane = planeInfo(kind.plane, slice);
  const levels = contourLevels(c, slice, kind);

  // Printed units: lengths in the chosen unit, ψ in unit^−3/2, |ψ|² in unit^−3.
  const p = unit.perBohr;
  const valueFactor = kind.quantity === 'psi' ? Math.pow(p, -1.5) : Math.pow(p, -3);
  const barAxis = makeAxis(
    scale.lo * valueFactor,
    scale.hi * valueFactor,
    kind.quantity === 'psi' ? [italic('ψ')] : [plain('|'), italic('ψ'), plain('|'), sup('2')],
    [plain(unit.symbol), sup(kind.quantity === 'psi' ? '\u22123/2' : '\u22123')],
    true,
    5,
  );
  const uAxis = makeAxis(-half * p, half * p, plane.uTitle, [plain(unit.symbol)], true);
  const vAxis = makeAxis(-half * p, half * p, plane.vTitle, [plain(unit.symbol)], true);

  // Layout: title line, square image with axes, colour bar on the right.
  const { widthMm, heightMm, dpi } = spec.print;
  const titleSize = style.fontSizePt;
  const top = MARGIN_MM + capHeightMm(titleSize) + 2.6;
  const left = MARGIN_MM + yAxisWidthMm(vAxis, style);
  const barLabelWidth = Math.max(
    ...barAxis.ticks.values.map(
      (v) => layoutRuns([plain(tickLabel(barAxis, v))], style.smallSizePt, 'start').widthMm,
    ),
  );
  const right =
    BAR_GAP_MM +
    BAR_WIDTH_MM +
    style.tickLengthMm +
    0.8 +
    barLabelWidth +
    2.2 +
    capHeightMm(style.fontSizePt) * 1.3 +
    MARGIN_MM;
  const bottom = xAxisHeightMm(style) + MARGIN_MM;
  const mmPerPixel = 25.4 / dpi;
  const side = Math.min(widthMm - left - right, heightMm - top - bottom);
  if (side < 20)
    throw new FigureSpecError(
      'print',
      `${widthMm} × ${heightMm} mm leaves only ${side.toFixed(1)} mm for the slice; make the figure larger`,
    );
  // The raster sits on whole pixels of the print grid, so PNG output needs no resampling.
  const pixels = Math.floor(side / mmPerPixel);
  const imageSide = pixels * mmPerPixel;
  // Spare room is shared equally on both sides, so the block sits in the middle of the page.
  const spareX = (widthMm - left - right - imageSide) / 2;
  const spareY = (heightMm - top - bottom - imageSide) / 2;
  const x0 = Math.round((left + spareX) / mmPerPixel) * mmPerPixel;
  const y0 = Math.round((top + spareY) / mmPerPixel) * mmPerPixel;
  const frame: Frame = { x0, y0, x1: x0 + imageSide, y1: y0 + imageSide };

  const image: ImageNode = {
    type: 'image',
    x: x0,
    y: y0,
    width: imageSide,
    height: imageSide,
    pixelWidth: pixels,
    pixelHeight: pixels,
    rgba: colourField(slice, values, scale, pixels),
    role: 'colour-field',
  };
  const toX = (u: number): number => x0 + ((u + half) / (2 * half)) * imageSide;
  const toY = (v: number): number => y0 + ((half - v) / (2 * half)) * imageSide;

  const contourNodes: SceneNode[] = [];
  const placer = new LabelPlacer({
    x0: frame.x0 + 0.5,
    y0: frame.y0 + 0.5,
    x1: frame.x1 - 0.5,
    y1: frame.y1 - 0.5,
  });
  const labelNodes: SceneNode[] = [];
  const facts: SceneFact[] = [];
  levels.contours.forEach((level, k) => {
    const dashed = kind.quantity === 'psi' && level.level < 0;
    const stroke = {
      colour: style.ink,
      widthPt: style.lineWidthPt * 0.9,
      dashPt: dashed ? [2.2, 1.4] : undefined,
      join: 'round' as const,
    };
    let rightmost: [number, number] | null = null;
    for (const line of level.lines) {
      const pts = line.points.map(([u, v]) => [toX(u), toY(v)] as [number, number]);
      contourNodes.push({
        type: 'path',
        commands: polylineCommands(pts, line.closed),
        stroke,
        role: 'contour',
      });
      placer.avoidCurve(line.closed ? [...pts, pts[0]] : pts);
      for (const pt of pts) if (!rightmost || pt[0] > rightmost[0]) rightmost = pt;
    }
    const label = levels.labels[k];
    if (label && rightmost) {
      const at = rightmost;
      const placed = placeNear(placer, at, capHeightMm(style.smallSizePt), (x, y, anchor) =>
        text(x, y, [plain(label)], style.smallSizePt, anchor, style.ink, 'contour-label'),
      );
      if (placed) {
        labelNodes.push(placed.label);
        facts.push({
          name: `contour enclosing ${label} in 3D`,
          value: Number(label.replace(' %', '')),
          unit: '%',
          printed: label,
        });
      }
    }
  });

  const nodes: SceneNode[] = [
    image,
    {
      type: 'group',
      clip: { x: x0, y: y0, width: imageSide, height: imageSide },
      children: contourNodes,
      role: 'contours',
    },
    ...labelNodes,
    ...axisNodes(frame, uAxis, vAxis, style, { xLabels: true, zeroLine: false }),
    ...colourBar(
      scale,
      barAxis,
      frame.x1 + BAR_GAP_MM,
      y0,
      frame.y1,
      levels.contours.map((l) => ({
        value: l.level * valueFactor,
        dashed: kind.quantity === 'psi' && l.level < 0,
      })),
      style,
    ),
  ];
  const stateRuns = stateLabelRuns(spec.state.terms, spec.look.label);
  const quantityRuns: TextRun[] =
    kind.quantity === 'psi' ? [italic('ψ')] : [plain('|'), italic('ψ'), plain('|'), sup('2')];
  const titleRuns: TextRun[] = spec.look.showLabel
    ? [...stateRuns, plain(', '), ...quantityRuns, plain(` in the ${plane.name}`)]
    : [...quantityRuns, plain(` in the ${plane.name}`)];
  nodes.push(text(x0, y0 - 2.6, titleRuns, titleSize, 'start', style.ink, 'title'));

  const stateName = runsText(stateRuns);
  const what = kind.quantity === 'psi' ? 'signed wavefunction ψ' : 'probability density |ψ|²';
  const notes = [levels.note, 'The colour scale is linear in the value; white is zero.'].filter(
    (n) => n !== '',
  );
  if (kind.quantity === 'psi' && Math.abs(c.removedPhase.re - 1) > 1e-12)
    notes.push(
      'An overall phase factor of the state was removed to make ψ real; the signs of the lobes are a convention.',
    );
  return sceneForSpec(spec, nodes, {
    title: `${stateName}: ${what} in the ${plane.name} (${describeSystem(spec)})`,
    altText: `Colour map of the ${what} of ${stateName} in the ${plane.name}, from ${formatSignificant(-half * p, 3)} to ${formatSignificant(half * p, 3)} ${unit.symbol} along each axis, ${kind.quantity === 'psi' ? `${style.positive} for positive and ${style.negative} for negative values` : 'darker where the density is higher'}, with ${levels.contours.length} contour levels.`,
    facts,
    notes,
  });
}
