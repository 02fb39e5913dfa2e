/**
 * The shipped Inter faces (assets/fonts, SIL OFL 1.1) for print output: file paths for pdfkit to
 * embed, and glyph outlines (via fontkit, pdfkit's own font engine) so PNGs draw text as paths with
 * exactly the advances of shared/figures/font-metrics.ts and no system font is ever consulted.
 */
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { FontFace } from '../../shared/figures/font-metrics';
import { MM_PER_PT } from '../../shared/figures/scene';
import { svgNumber, type GlyphOutliner } from '../../shared/figures/scene-to-svg';

interface FontkitPathCommand {
  command: 'moveTo' | 'lineTo' | 'quadraticCurveTo' | 'bezierCurveTo' | 'closePath';
  args: number[];
}
interface FontkitGlyph {
  advanceWidth: number;
  path: { commands: FontkitPathCommand[] };
}
export interface FontkitFont {
  unitsPerEm: number;
  postscriptName: string;
  glyphForCodePoint(cp: number): FontkitGlyph;
}

const fontkit = createRequire(import.meta.url)('fontkit') as {
  create(buffer: Buffer): FontkitFont;
};

export const FONT_DIR = join(
  dirname(fileURLToPath(import.meta.url)),
  '..',
  '..',
  'assets',
  'fonts',
);
export const FONT_FACES: readonly FontFace[] = ['regular', 'italic', 'semibold', 'semibold-italic'];

export function fontPath(face: FontFace): string {
  return join(FONT_DIR, `inter-${face}.otf`);
}

const bytes = new Map<FontFace, Buffer>();
const fonts = new Map<FontFace, FontkitFont>();

/** The face's file contents (read once per process). */
export function fontBytes(face: FontFace): Buffer {
  let b = bytes.get(face);
  if (!b) {
    b = readFileSync(fontPath(face));
    bytes.set(face, b);
  }
  return b;
}

export function loadFont(face: FontFace): FontkitFont {
  let f = fonts.get(face);
  if (!f) {
    f = fontkit.create(fontBytes(face));
    fonts.set(face, f);
  }
  return f;
}

interface GlyphShape {
  advance: number;
  commands: FontkitPathCommand[];
}
const shapes = new Map<string, GlyphShape>();

function glyphShape(face: FontFace, cp: number): GlyphShape {
  const key = `${face}:${cp}`;
  let s = shapes.get(key);
  if (!s) {
    const glyph = loadFont(face).glyphForCodePoint(cp);
    s = { advance: glyph.advanceWidth, commands: glyph.path.commands };
    shapes.set(key, s);
  }
  return s;
}

/**
 * SVG path data (mm, y down, origin at the baseline start) of a string in one face: glyph after
 * glyph by their plain advances, as font-metrics.ts measures them (no kerning, no ligatures).
 */
export const glyphOutlines: GlyphOutliner = (text, face, sizePt) => {
  const font = loadFont(face);
  const scale = (sizePt * MM_PER_PT) / font.unitsPerEm;
  const n = svgNumber;
  const out: string[] = [];
  let pen = 0;
  for (const ch of text) {
    const shape = glyphShape(face, ch.codePointAt(0) as number);
    const X = (x: number): string => n(pen + x * scale);
    const Y = (y: number): string => n(-y * scale);
    for (const { command, args: a } of shape.commands) {
      if (command === 'moveTo') out.push(`M${X(a[0])} ${Y(a[1])}`);
      else if (command === 'lineTo') out.push(`L${X(a[0])} ${Y(a[1])}`);
      else if (command === 'quadraticCurveTo')
        out.push(`Q${X(a[0])} ${Y(a[1])} ${X(a[2])} ${Y(a[3])}`);
      else if (command === 'bezierCurveTo')
        out.push(`C${X(a[0])} ${Y(a[1])} ${X(a[2])} ${Y(a[3])} ${X(a[4])} ${Y(a[5])}`);
      else out.push('Z');
    }
    pen += shape.advance * scale;
  }
  return out.join('');
};
