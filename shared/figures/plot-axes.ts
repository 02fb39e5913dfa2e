/**
 * Axes of 2D plots in the scene model: a plot rectangle in mm, linear scales, left and bottom axis
 * lines with outward ticks, tick labels and axis titles (quantity / unit, ISO 80000-1 style), and
 * a power-of-ten factor moved into the title when tick values would need many zeros.
 */
import { formatFixed } from './number-format';
import { niceTicksWithin, snugTicks, type TickSet } from './nice-ticks';
import { lineNode, type SceneNode, type TextNode, type TextRun } from './scene';
import type { FigureStyle } from './figure-style';
import { capHeightMm, layoutRuns } from './text-layout';

export interface Frame {
  x0: number;
  y0: number;
  x1: number;
  y1: number;
}

export type Scale = (value: number) => number;

export function linearScale(
  domainLo: number,
  domainHi: number,
  rangeLo: number,
  rangeHi: number,
): Scale {
  const k = (rangeHi - rangeLo) / (domainHi - domainLo);
  return (v) => rangeLo + (v - domainLo) * k;
}

export interface AxisDef {
  /** Ticks in printed units (already divided by 10^exponent). */
  ticks: TickSet;
  /** Power of ten taken out of the tick values (0 for none). */
  exponent: number;
  /** Quantity symbol runs, e.g. [r] or [R]. */
  quantity: TextRun[];
  /** Unit runs, e.g. [bohr, ^−3/2]; empty for a dimensionless quantity. */
  unit: TextRun[];
}

/** Values whose ticks would print more than two leading zeros or five digits get a factor 10^(3k). */
export function chooseExponent(lo: number, hi: number): number {
  const largest = Math.max(Math.abs(lo), Math.abs(hi));
  if (largest === 0) return 0;
  const magnitude = Math.floor(Math.log10(largest));
  if (magnitude >= -2 && magnitude < 4) return 0;
  return 3 * Math.floor(magnitude / 3);
}

/** An axis over [lo, hi] (values in printed units before the factor); `fixed` keeps the ends. */
export function makeAxis(
  lo: number,
  hi: number,
  quantity: TextRun[],
  unit: TextRun[],
  fixed = false,
  target = 5,
): AxisDef {
  const exponent = chooseExponent(lo, hi);
  const f = Math.pow(10, -exponent);
  const ticks = fixed ? niceTicksWithin(lo * f, hi * f, target) : snugTicks(lo * f, hi * f);
  return { ticks, exponent, quantity, unit };
}

export function axisTitleRuns(axis: AxisDef): TextRun[] {
  const runs: TextRun[] = [...axis.quantity];
  if (axis.unit.length === 0 && axis.exponent === 0) return runs;
  runs.push({ text: ' / ', shift: 'base' });
  if (axis.exponent !== 0) {
    runs.push({ text: '10', shift: 'base' }, { text: formatFixed(axis.exponent, 0), shift: 'sup' });
    if (axis.unit.length > 0) runs.push({ text: ' ', shift: 'base' });
  }
  runs.push(...axis.unit);
  return runs;
}

export function tickLabel(axis: AxisDef, value: number): string {
  return formatFixed(value, axis.ticks.decimals);
}

const TICK_LABEL_GAP = 0.9;
const TITLE_GAP = 1.6;

/** Width needed left of the frame for the y tick labels and the rotated title. */
export function yAxisWidthMm(axis: AxisDef, style: FigureStyle): number {
  const widest = Math.max(
    ...axis.ticks.values.map(
      (v) =>
        layoutRuns([{ text: tickLabel(axis, v), shift: 'base' }], style.smallSizePt, 'end').widthMm,
    ),
  );
  return (
    style.tickLengthMm + TICK_LABEL_GAP + widest + TITLE_GAP + capHeightMm(style.fontSizePt) * 1.25
  );
}

/** Height needed below the frame for the x tick labels and the title. */
export function xAxisHeightMm(style: FigureStyle): number {
  return (
    style.tickLengthMm +
    TICK_LABEL_GAP +
    capHeightMm(style.smallSizePt) +
    TITLE_GAP +
    capHeightMm(style.fontSizePt) * 1.45
  );
}

export interface AxisDrawOptions {
  /** Draw tick labels and title of the x axis (false for upper panels sharing it). */
  xLabels: boolean;
  /** Draw a thin line at y = 0 when 0 lies inside the y range. */
  zeroLine: boolean;
}

export function axisNodes(
  frame: Frame,
  x: AxisDef,
  y: AxisDef,
  style: FigureStyle,
  options: AxisDrawOptions,
): SceneNode[] {
  const nodes: SceneNode[] = [];
  const sx = linearScale(x.ticks.min, x.ticks.max, frame.x0, frame.x1);
  const sy = linearScale(y.ticks.min, y.ticks.max, frame.y1, frame.y0);
  const axisStroke = { colour: style.ink, widthPt: style.axisWidthPt, cap: 'square' as const };
  const t = style.tickLengthMm;
  if (options.zeroLine && y.ticks.min < 0 && y.ticks.max > 0) {
    nodes.push(
      lineNode(
        frame.x0,
        sy(0),
        frame.x1,
        sy(0),
        { colour: style.faint, widthPt: style.axisWidthPt },
        'zero-line',
      ),
    );
  }
  nodes.push(lineNode(frame.x0, frame.y1, frame.x1, frame.y1, axisStroke, 'x-axis'));
  nodes.push(lineNode(frame.x0, frame.y0, frame.x0, frame.y1, axisStroke, 'y-axis'));
  const labelSize = style.smallSizePt;
  for (const v of x.ticks.values) {
    const px = sx(v);
    nodes.push(lineNode(px, frame.y1, px, frame.y1 + t, axisStroke, 'x-tick'));
    if (options.xLabels) {
      nodes.push(
        text(
          px,
          frame.y1 + t + TICK_LABEL_GAP + capHeightMm(labelSize),
          [{ text: tickLabel(x, v), shift: 'base' }],
          labelSize,
          'middle',
          style.ink,
          'x-tick-label',
        ),
      );
    }
  }
  for (const v of y.ticks.values) {
    const py = sy(v);
    nodes.push(lineNode(frame.x0 - t, py, frame.x0, py, axisStroke, 'y-tick'));
    nodes.push(
      text(
        frame.x0 - t - TICK_LABEL_GAP,
        py + capHeightMm(labelSize) / 2,
        [{ text: tickLabel(y, v), shift: 'base' }],
        labelSize,
        'end',
        style.ink,
        'y-tick-label',
      ),
    );
  }
  if (options.xLabels) {
    const baseline =
      frame.y1 +
      t +
      TICK_LABEL_GAP +
      capHeightMm(labelSize) +
      TITLE_GAP +
      capHeightMm(style.fontSizePt) * 1.1;
    nodes.push(
      text(
        (frame.x0 + frame.x1) / 2,
        baseline,
        axisTitleRuns(x),
        style.fontSizePt,
        'middle',
        style.ink,
        'x-title',
      ),
    );
  }
  const widest = Math.max(
    ...y.ticks.values.map(
      (v) => layoutRuns([{ text: tickLabel(y, v), shift: 'base' }], labelSize, 'end').widthMm,
    ),
  );
  const titleX = frame.x0 - t - TICK_LABEL_GAP - widest - TITLE_GAP;
  const title = text(
    titleX,
    (frame.y0 + frame.y1) / 2,
    axisTitleRuns(y),
    style.fontSizePt,
    'middle',
    style.ink,
    'y-title',
  );
  title.rotationDeg = -90;
  nodes.push(title);
  return nodes;
}

export function text(
  x: number,
  y: number,
  runs: TextRun[],
  sizePt: number,
  anchor: TextNode['anchor'],
  colour: string,
  role?: string,
): TextNode {
  return { type: 'text', x, y, runs, sizePt, anchor, colour, role };
}
