/**
 * Scene → PDF with pdfkit: one page exactly the figure's size in points (mm / 25.4 × 72), vector
 * paths, real text in the embedded, subset Inter faces (so the labels can be searched and copied),
 * sub- and superscripts by size and baseline shift, rasters embedded at the scene's dpi.
 *
 * Determinism: pdfkit derives the document ID from the info dictionary, which we build from the
 * scene alone (a fixed date only for that derivation; no CreationDate is written; PDF 1.3, so no
 * XMP packet either), so the same scene gives the same bytes. Kerning and ligatures are off, matching shared/figures/font-metrics.
 */
import PDFDocument from 'pdfkit';
import type { FontFace } from '../../shared/figures/font-metrics';
import { encodePng } from '../../shared/figures/png-encode';
import {
  MM_PER_PT,
  type FigureScene,
  type PathCommand,
  type SceneNode,
  type Stroke,
} from '../../shared/figures/scene';
import { layoutText } from '../../shared/figures/text-layout';
import { FONT_FACES, fontBytes } from './fonts';

const PT_PER_MM = 72 / 25.4;
/** Only used to derive pdfkit's document ID; never written to the file. */
const FIXED_DATE = new Date(Date.UTC(2000, 0, 1));
/** fontkit features switched off so glyphs advance exactly as font-metrics.ts measures them. */
const PLAIN_TEXT_FEATURES = {
  kern: false,
  liga: false,
  calt: false,
  clig: false,
  dlig: false,
} as const;

export interface PdfOptions {
  /** Write this creation date into the file (off by default: same scene → same bytes). */
  creationDate?: Date;
}

export function pagePoints(mm: number): number {
  return Math.round(mm * PT_PER_MM * 1000) / 1000;
}

function tracePath(doc: PDFKit.PDFDocument, commands: readonly PathCommand[]): void {
  for (const c of commands) {
    if (c.op === 'move') doc.moveTo(c.x, c.y);
    else if (c.op === 'line') doc.lineTo(c.x, c.y);
    else if (c.op === 'cubic') doc.bezierCurveTo(c.x1, c.y1, c.x2, c.y2, c.x, c.y);
    else doc.closePath();
  }
}

function applyStroke(doc: PDFKit.PDFDocument, s: Stroke): void {
  doc.lineWidth(s.widthPt * MM_PER_PT);
  doc.strokeColor(s.colour, s.opacity ?? 1);
  doc.lineCap(s.cap ?? 'butt');
  doc.lineJoin(s.join ?? 'round');
  // pdfkit accepts a dash array at run time; its type declarations only list a single length.
  if (s.dashPt && s.dashPt.length > 0)
    doc.dash(s.dashPt.map((d) => d * MM_PER_PT) as unknown as number, {});
  else doc.undash();
}

function drawNode(doc: PDFKit.PDFDocument, node: SceneNode, dpi: number): void {
  switch (node.type) {
    case 'path': {
      if (!node.stroke && !node.fill) return;
      doc.save();
      tracePath(doc, node.commands);
      if (node.fill) doc.fillColor(node.fill.colour, node.fill.opacity ?? 1);
      if (node.stroke) applyStroke(doc, node.stroke);
      if (node.fill && node.stroke) doc.fillAndStroke();
      else if (node.fill) doc.fill();
      else doc.stroke();
      doc.restore();
      return;
    }
    case 'text': {
      const layout = layoutText(node);
      doc.save();
      doc.translate(node.x, node.y);
      if (node.rotationDeg) doc.rotate(node.rotationDeg, { origin: [0, 0] });
      doc.fillColor(node.colour);
      for (const run of layout.runs) {
        doc.font(run.face).fontSize(run.sizePt * MM_PER_PT);
        doc.text(run.text, run.dx, run.dy, {
          lineBreak: false,
          baseline: 'alphabetic',
          features: PLAIN_TEXT_FEATURES as unknown as PDFKit.Mixins.TextOptions['features'],
        });
      }
      doc.restore();
      return;
    }
    case 'image': {
      const png = encodePng(node.pixelWidth, node.pixelHeight, node.rgba, { dpi, level: 1 });
      doc.image(Buffer.from(png.buffer, png.byteOffset, png.byteLength), node.x, node.y, {
        width: node.width,
        height: node.height,
      });
      return;
    }
    case 'group': {
      doc.save();
      if (node.clip) doc.rect(node.clip.x, node.clip.y, node.clip.width, node.clip.height).clip();
      for (const child of node.children) drawNode(doc, child, dpi);
      doc.restore();
      return;
    }
  }
}

export function sceneToPdf(scene: FigureScene, options: PdfOptions = {}): Promise<Buffer> {
  const info: Record<string, unknown> = {
    Title: scene.metadata.title,
    Subject: scene.metadata.altText,
    Creator: 'Lobewright',
    Producer: 'Lobewright',
    CreationDate: options.creationDate ?? FIXED_DATE,
  };
  const doc = new PDFDocument({
    size: [pagePoints(scene.widthMm), pagePoints(scene.heightMm)],
    margin: 0,
    compress: true,
    autoFirstPage: true,
    info: info as PDFKit.DocumentInfo,
    displayTitle: true,
  });
  // pdfkit reads CreationDate (ID, XMP) but writes only the enumerable info keys to the file.
  if (!options.creationDate)
    Object.defineProperty(doc.info, 'CreationDate', { value: FIXED_DATE, enumerable: false });
  for (const face of FONT_FACES) doc.registerFont(face, fontBytes(face as FontFace));
  const chunks: Buffer[] = [];
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('data', (c: Buffer) => chunks.push(c));
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });
  doc.scale(PT_PER_MM);
  if (scene.background === 'white') doc.rect(0, 0, scene.widthMm, scene.heightMm).fill('#ffffff');
  for (const node of scene.children) drawNode(doc, node, scene.dpi);
  doc.end();
  return done;
}
