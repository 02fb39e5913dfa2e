/**
 * The scene model: a figure as vector primitives in print units, the one thing the SVG, PDF and PNG
 * renderers draw. Page coordinates are millimetres, origin top-left, y down; stroke widths and font
 * sizes are points (1 pt = 25.4/72 mm). Pure data: no DOM, no Node.
 */

export type HexColour = string;

export interface Stroke {
  colour: HexColour;
  widthPt: number;
  /** Dash pattern in pt (on, off, …); absent for a solid line. */
  dashPt?: number[];
  cap?: 'butt' | 'round' | 'square';
  join?: 'miter' | 'round' | 'bevel';
  opacity?: number;
}

export interface Fill {
  colour: HexColour;
  opacity?: number;
}

export type PathCommand =
  | { op: 'move'; x: number; y: number }
  | { op: 'line'; x: number; y: number }
  | { op: 'cubic'; x1: number; y1: number; x2: number; y2: number; x: number; y: number }
  | { op: 'close' };

export interface PathNode {
  type: 'path';
  commands: PathCommand[];
  stroke?: Stroke;
  fill?: Fill;
  /** What the path shows ("curve", "axis", "contour", …): for tests and accessibility, not drawn. */
  role?: string;
}

export interface TextRun {
  text: string;
  shift: 'base' | 'sub' | 'sup';
  italic?: boolean;
  /** 400 (regular) or 600 (semibold); default 400. */
  weight?: 400 | 600;
}

export interface TextNode {
  type: 'text';
  /** Anchor point on the baseline, mm. */
  x: number;
  y: number;
  runs: TextRun[];
  sizePt: number;
  anchor: 'start' | 'middle' | 'end';
  /** Clockwise rotation in degrees about the anchor point (−90 reads bottom to top). */
  rotationDeg?: number;
  colour: HexColour;
  role?: string;
}

export interface ImageNode {
  type: 'image';
  /** Placement rectangle in mm; the raster fills it exactly. */
  x: number;
  y: number;
  width: number;
  height: number;
  pixelWidth: number;
  pixelHeight: number;
  /** Row-major RGBA, top row first, 4 bytes per pixel, sRGB. */
  rgba: Uint8Array;
  role?: string;
}

export interface ClipRect {
  x: number;
  y: number;
  width: number;
  height: number;
}

export interface GroupNode {
  type: 'group';
  clip?: ClipRect;
  children: SceneNode[];
  role?: string;
}

export type SceneNode = PathNode | TextNode | ImageNode | GroupNode;

/** A number the figure prints, with what it is: for alt text, captions and tests. */
export interface SceneFact {
  /** What the number is, e.g. "2s radial node" or "Balmer Hα vacuum wavelength". */
  name: string;
  value: number;
  unit: string;
  /** The number as printed in the figure (same rounding, same unit). */
  printed: string;
}

export interface SceneMetadata {
  title: string;
  altText: string;
  facts: SceneFact[];
  /** Cautions where the figure could mislead a reader. */
  notes: string[];
}

export interface FigureScene {
  widthMm: number;
  heightMm: number;
  background: 'transparent' | 'white';
  /** Resolution of embedded rasters and of PNG output. */
  dpi: number;
  children: SceneNode[];
  metadata: SceneMetadata;
}

export const MM_PER_PT = 25.4 / 72;
export const ptToMm = (pt: number): number => pt * MM_PER_PT;
export const mmToPt = (mm: number): number => mm / MM_PER_PT;

/** A polyline (or polygon when closed) through points [x, y] in mm. */
export function polylineCommands(
  points: readonly (readonly [number, number])[],
  closed = false,
): PathCommand[] {
  const commands: PathCommand[] = [];
  points.forEach(([x, y], i) => commands.push({ op: i === 0 ? 'move' : 'line', x, y }));
  if (closed && points.length > 2) commands.push({ op: 'close' });
  return commands;
}

export function lineNode(
  x1: number,
  y1: number,
  x2: number,
  y2: number,
  stroke: Stroke,
  role?: string,
): PathNode {
  return {
    type: 'path',
    commands: polylineCommands([
      [x1, y1],
      [x2, y2],
    ]),
    stroke,
    role,
  };
}

export function rectCommands(x: number, y: number, width: number, height: number): PathCommand[] {
  return polylineCommands(
    [
      [x, y],
      [x + width, y],
      [x + width, y + height],
      [x, y + height],
    ],
    true,
  );
}

/** A circle of radius r as four cubic Béziers (κ = 0.5523, the usual quarter-circle constant). */
export function circleCommands(cx: number, cy: number, r: number): PathCommand[] {
  const k = 0.5522847498 * r;
  return [
    { op: 'move', x: cx + r, y: cy },
    { op: 'cubic', x1: cx + r, y1: cy + k, x2: cx + k, y2: cy + r, x: cx, y: cy + r },
    { op: 'cubic', x1: cx - k, y1: cy + r, x2: cx - r, y2: cy + k, x: cx - r, y: cy },
    { op: 'cubic', x1: cx - r, y1: cy - k, x2: cx - k, y2: cy - r, x: cx, y: cy - r },
    { op: 'cubic', x1: cx + k, y1: cy - r, x2: cx + r, y2: cy - k, x: cx + r, y: cy },
    { op: 'close' },
  ];
}

/** Every node of a scene, depth first (groups included), for tests and checks. */
export function* walkScene(nodes: readonly SceneNode[]): Generator<SceneNode> {
  for (const node of nodes) {
    yield node;
    if (node.type === 'group') yield* walkScene(node.children);
  }
}

/** The plain text of a text node's runs. */
export function runsText(runs: readonly TextRun[]): string {
  return runs.map((r) => r.text).join('');
}
