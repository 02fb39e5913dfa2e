/**
 * Text layout without a DOM: where each run of a text node goes, measured from the committed font
 * metrics (./font-metrics), so the browser, the PDF and the PNG place every glyph identically.
 *
 * Sub- and superscripts are set at SCRIPT_SCALE of the base size and shifted by a fraction of the
 * base size (common practice in typesetting; values close to the OS/2 script metrics of Inter).
 * No kerning and no ligatures anywhere (the renderers switch them off).
 */
import { FONT_METRICS, type FaceMetrics, type FontFace } from './font-metrics';
import { ptToMm, type TextNode, type TextRun } from './scene';

export const SCRIPT_SCALE = 0.7;
/** Baseline shifts in units of the base font size; positive is down the page. */
export const SUB_SHIFT_EM = 0.16;
export const SUP_SHIFT_EM = -0.36;

export function runFace(run: Pick<TextRun, 'italic' | 'weight'>): FontFace {
  const bold = (run.weight ?? 400) >= 600;
  if (run.italic) return bold ? 'semibold-italic' : 'italic';
  return bold ? 'semibold' : 'regular';
}

export function faceMetrics(face: FontFace): FaceMetrics {
  return FONT_METRICS[face];
}

/** Advance of a string at a size, in mm (sum of glyph advances). */
export function stringWidthMm(text: string, face: FontFace, sizePt: number): number {
  const m = FONT_METRICS[face];
  let units = 0;
  for (const ch of text) units += m.advances[ch.codePointAt(0) as number] ?? m.fallbackAdvance;
  return ptToMm((units / m.unitsPerEm) * sizePt);
}

export interface PlacedRun {
  text: string;
  face: FontFace;
  sizePt: number;
  /** Offset of the run's baseline start from the node's anchor point, mm (before rotation). */
  dx: number;
  dy: number;
  widthMm: number;
}

export interface TextLayout {
  runs: PlacedRun[];
  widthMm: number;
  /** Extent above and below the anchor baseline, mm (positive numbers). */
  ascentMm: number;
  descentMm: number;
}

export function runSizePt(sizePt: number, shift: TextRun['shift']): number {
  return shift === 'base' ? sizePt : sizePt * SCRIPT_SCALE;
}

export function layoutRuns(
  runs: readonly TextRun[],
  sizePt: number,
  anchor: TextNode['anchor'],
): TextLayout {
  const placed: PlacedRun[] = [];
  let x = 0;
  let ascent = 0;
  let descent = 0;
  for (const run of runs) {
    if (run.text === '') continue;
    const face = runFace(run);
    const size = runSizePt(sizePt, run.shift);
    const dy =
      run.shift === 'sub'
        ? ptToMm(SUB_SHIFT_EM * sizePt)
        : run.shift === 'sup'
          ? ptToMm(SUP_SHIFT_EM * sizePt)
          : 0;
    const widthMm = stringWidthMm(run.text, face, size);
    const m = FONT_METRICS[face];
    ascent = Math.max(ascent, ptToMm((m.capHeight / m.unitsPerEm) * size) - dy);
    descent = Math.max(descent, ptToMm((-m.descent / m.unitsPerEm) * size * 0.7) + dy);
    placed.push({ text: run.text, face, sizePt: size, dx: x, dy, widthMm });
    x += widthMm;
  }
  const shift = anchor === 'middle' ? -x / 2 : anchor === 'end' ? -x : 0;
  for (const p of placed) p.dx += shift;
  return { runs: placed, widthMm: x, ascentMm: ascent, descentMm: descent };
}

/** Height of capital letters at a size, mm: used to centre labels on a point or a line. */
export function capHeightMm(sizePt: number, face: FontFace = 'regular'): number {
  const m = FONT_METRICS[face];
  return ptToMm((m.capHeight / m.unitsPerEm) * sizePt);
}

export function layoutText(node: Pick<TextNode, 'runs' | 'sizePt' | 'anchor'>): TextLayout {
  return layoutRuns(node.runs, node.sizePt, node.anchor);
}

export interface Box {
  x0: number;
  y0: number;
  x1: number;
  y1: number;
}

/** Page-space bounding box of a text node (rotations by multiples of 90° exactly, others by the corners). */
export function textBox(node: TextNode): Box {
  const layout = layoutText(node);
  const left = layout.runs.length > 0 ? layout.runs[0].dx : 0;
  const corners: [number, number][] = [
    [left, -layout.ascentMm],
    [left + layout.widthMm, -layout.ascentMm],
    [left, layout.descentMm],
    [left + layout.widthMm, layout.descentMm],
  ];
  const a = ((node.rotationDeg ?? 0) * Math.PI) / 180;
  const c = Math.cos(a);
  const s = Math.sin(a);
  const xs = corners.map(([x, y]) => node.x + x * c - y * s);
  const ys = corners.map(([x, y]) => node.y + x * s + y * c);
  return { x0: Math.min(...xs), y0: Math.min(...ys), x1: Math.max(...xs), y1: Math.max(...ys) };
}

export function boxesOverlap(a: Box, b: Box, gap = 0): boolean {
  return a.x0 < b.x1 + gap && b.x0 < a.x1 + gap && a.y0 < b.y1 + gap && b.y0 < a.y1 + gap;
}
