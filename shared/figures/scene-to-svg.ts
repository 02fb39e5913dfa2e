/**
 * Scene → standalone SVG 1.1/2 document: width and height in mm, viewBox in mm, text as <text> in
 * "Lobewright Sans" (the client's @font-face) with every run placed explicitly from the committed
 * metrics, rasters as data: PNG URIs. Deterministic: the same scene gives the same string
 * (numbers rounded to 0.001 mm, ids numbered in document order).
 *
 * With `glyphOutlines` the text is drawn as filled glyph outlines instead (the PNG renderer does this,
 * so no system font is ever involved).
 */
import type { FontFace } from './font-metrics';
import { base64, encodePng } from './png-encode';
import {
  MM_PER_PT,
  type FigureScene,
  type ImageNode,
  type PathCommand,
  type SceneNode,
  type Stroke,
  type TextNode,
} from './scene';
import { layoutText } from './text-layout';

/** SVG path data (mm, y down, origin at the run's baseline start) for a string set in one face. */
export type GlyphOutliner = (text: string, face: FontFace, sizePt: number) => string;

export interface SvgOptions {
  glyphOutlines?: GlyphOutliner;
  /** Pixel size for the root element instead of mm (the PNG renderer asks for exact pixels). */
  pixelSize?: { width: number; height: number };
}

export const SVG_FONT_FAMILY = "'Lobewright Sans', Inter, sans-serif";

export function svgNumber(v: number): string {
  const r = Math.round(v * 1000) / 1000;
  return Object.is(r, -0) ? '0' : String(r);
}

export function escapeXml(text: string): string {
  return text.replace(
    /[&<>"']/g,
    (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&apos;' })[c] as string,
  );
}

export function pathData(commands: readonly PathCommand[]): string {
  const n = svgNumber;
  const out: string[] = [];
  for (const c of commands) {
    if (c.op === 'move') out.push(`M${n(c.x)} ${n(c.y)}`);
    else if (c.op === 'line') out.push(`L${n(c.x)} ${n(c.y)}`);
    else if (c.op === 'cubic')
      out.push(`C${n(c.x1)} ${n(c.y1)} ${n(c.x2)} ${n(c.y2)} ${n(c.x)} ${n(c.y)}`);
    else out.push('Z');
  }
  return out.join('');
}

function strokeAttributes(s: Stroke | undefined): string {
  if (!s) return ' stroke="none"';
  let a = ` stroke="${s.colour}" stroke-width="${svgNumber(s.widthPt * MM_PER_PT)}"`;
  if (s.dashPt && s.dashPt.length > 0)
    a += ` stroke-dasharray="${s.dashPt.map((d) => svgNumber(d * MM_PER_PT)).join(' ')}"`;
  a += ` stroke-linecap="${s.cap ?? 'butt'}" stroke-linejoin="${s.join ?? 'round'}"`;
  if (s.opacity !== undefined && s.opacity < 1) a += ` stroke-opacity="${svgNumber(s.opacity)}"`;
  return a;
}

const pngCache = new WeakMap<Uint8Array, string>();

export function imageDataUri(node: ImageNode, dpi?: number): string {
  let uri = pngCache.get(node.rgba);
  if (uri === undefined) {
    uri = `data:image/png;base64,${base64(encodePng(node.pixelWidth, node.pixelHeight, node.rgba, { dpi, level: 1 }))}`;
    pngCache.set(node.rgba, uri);
  }
  return uri;
}

function faceAttributes(face: FontFace): string {
  const italic = face === 'italic' || face === 'semibold-italic';
  const bold = face === 'semibold' || face === 'semibold-italic';
  return `${italic ? ' font-style="italic"' : ''}${bold ? ' font-weight="600"' : ''}`;
}

function textElement(node: TextNode, options: SvgOptions): string {
  const layout = layoutText(node);
  const n = svgNumber;
  const rotate = node.rotationDeg ? ` rotate(${n(node.rotationDeg)})` : '';
  const transform = `translate(${n(node.x)} ${n(node.y)})${rotate}`;
  if (options.glyphOutlines) {
    const paths = layout.runs
      .map((r) => {
        const d = (options.glyphOutlines as GlyphOutliner)(r.text, r.face, r.sizePt);
        return d === '' ? '' : `<path transform="translate(${n(r.dx)} ${n(r.dy)})" d="${d}"/>`;
      })
      .join('');
    return `<g transform="${transform}" fill="${node.colour}">${paths}</g>`;
  }
  const spans = layout.runs
    .map(
      (r) =>
        `<tspan x="${n(r.dx)}" y="${n(r.dy)}" font-size="${n(r.sizePt * MM_PER_PT)}"${faceAttributes(r.face)}>${escapeXml(r.text)}</tspan>`,
    )
    .join('');
  return `<text transform="${transform}" fill="${node.colour}" xml:space="preserve">${spans}</text>`;
}

class SvgWriter {
  private clipCount = 0;
  readonly defs: string[] = [];
  constructor(
    private readonly options: SvgOptions,
    private readonly dpi: number,
  ) {}

  node(node: SceneNode): string {
    switch (node.type) {
      case 'path': {
        const fill = node.fill
          ? ` fill="${node.fill.colour}"${node.fill.opacity !== undefined && node.fill.opacity < 1 ? ` fill-opacity="${svgNumber(node.fill.opacity)}"` : ''}`
          : ' fill="none"';
        return `<path d="${pathData(node.commands)}"${fill}${strokeAttributes(node.stroke)}/>`;
      }
      case 'text':
        return textElement(node, this.options);
      case 'image':
        return `<image x="${svgNumber(node.x)}" y="${svgNumber(node.y)}" width="${svgNumber(node.width)}" height="${svgNumber(node.height)}" preserveAspectRatio="none" href="${imageDataUri(node, this.dpi)}"/>`;
      case 'group': {
        let clip = '';
        if (node.clip) {
          const id = `clip${++this.clipCount}`;
          const c = node.clip;
          this.defs.push(
            `<clipPath id="${id}"><rect x="${svgNumber(c.x)}" y="${svgNumber(c.y)}" width="${svgNumber(c.width)}" height="${svgNumber(c.height)}"/></clipPath>`,
          );
          clip = ` clip-path="url(#${id})"`;
        }
        return `<g${clip}>${node.children.map((c) => this.node(c)).join('')}</g>`;
      }
    }
  }
}

export function sceneToSvg(scene: FigureScene, options: SvgOptions = {}): string {
  const writer = new SvgWriter(options, scene.dpi);
  const body = scene.children.map((c) => writer.node(c)).join('\n');
  const w = svgNumber(scene.widthMm);
  const h = svgNumber(scene.heightMm);
  const size = options.pixelSize
    ? `width="${options.pixelSize.width}" height="${options.pixelSize.height}" preserveAspectRatio="none"`
    : `width="${w}mm" height="${h}mm"`;
  const background =
    scene.background === 'white'
      ? `<rect x="0" y="0" width="${w}" height="${h}" fill="#ffffff"/>\n`
      : '';
  const style = options.glyphOutlines
    ? ''
    : `<style>text{font-family:${SVG_FONT_FAMILY};font-kerning:none;font-variant-ligatures:none;font-feature-settings:"kern" 0,"liga" 0,"calt" 0}</style>`;
  return [
    `<?xml version="1.0" encoding="UTF-8"?>`,
    `<svg xmlns="http://www.w3.org/2000/svg" version="1.1" ${size} viewBox="0 0 ${w} ${h}" role="img" aria-labelledby="figure-title figure-desc">`,
    `<title id="figure-title">${escapeXml(scene.metadata.title)}</title>`,
    `<desc id="figure-desc">${escapeXml(scene.metadata.altText)}</desc>`,
    `<defs>${style}${writer.defs.join('')}</defs>`,
    `${background}${body}`,
    `</svg>`,
    '',
  ].join('\n');
}
