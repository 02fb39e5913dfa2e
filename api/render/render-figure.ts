// Turns a resolved figure spec into one print file: PNG, TIFF, PDF or SVG. 2D kinds are vector
// scenes (shared/figures); 3D kinds are rasters from the browser's own scene code (render-3d.ts),
// placed in PDF and SVG under the vector overlay (labels, axes, scale bar).
import sharp from 'sharp';
import { buildFigureScene } from '../../shared/figures/build-figure-scene';
import type { FigureDatasets } from '../../shared/figures/radial-datasets';
import type { FigureScene, SceneNode } from '../../shared/figures/scene';
import { sceneToSvg } from '../../shared/figures/scene-to-svg';
import type { ResolvedFigureSpec } from '../../shared/spec/resolve-figure-spec';
import { AppError } from '../lib/app-error';
import { render3dPng } from './render-3d';
import { build3dOverlayNodes } from './overlay-3d';
import { sceneToPdf } from './scene-to-pdf';
import { sceneToPng } from './scene-to-png';

import { RENDERER_VERSION, renderFormats, type RenderFormat } from './render-key';

export { RENDERER_VERSION, renderFormats, type RenderFormat };

export interface RenderOptions {
  /** TIFF only: convert to CMYK with libvips' default profile (colours shift; see notes). */
  cmyk?: boolean;
  timeoutMs?: number;
  /** Uploaded points the spec's radial kind draws. */
  datasets?: FigureDatasets;
}

export interface RenderedFile {
  bytes: Buffer;
  contentType: string;
  extension: RenderFormat | 'tif';
  /** Numbers the figure shows, with units (for manifests and alt text). */
  facts: Record<string, unknown>;
  /** Cautions where the figure could mislead; also printed in export manifests. */
  notes: string[];
}

const CONTENT_TYPES: Record<RenderFormat, string> = {
  png: 'image/png',
  tiff: 'image/tiff',
  pdf: 'application/pdf',
  svg: 'image/svg+xml',
};

export function is3dKind(spec: ResolvedFigureSpec): boolean {
  const k = spec.kind;
  return (
    k.type === 'isosurface' || k.type === 'cloud' || (k.type === 'angular' && k.mode === 'surface')
  );
}

export async function renderFigure(
  spec: ResolvedFigureSpec,
  format: RenderFormat,
  options: RenderOptions = {},
): Promise<RenderedFile> {
  if (options.cmyk && format !== 'tiff') {
    throw new AppError(400, 'invalid_request', 'cmyk applies to TIFF only', {
      cmyk: 'CMYK conversion is offered for TIFF only',
    });
  }
  const { scene, rasterPng, facts } = is3dKind(spec)
    ? await render3d(spec, options)
    : render2d(spec, options.datasets);
  const notes = [...scene.metadata.notes];
  const done = (bytes: Buffer): RenderedFile => ({
    bytes,
    contentType: CONTENT_TYPES[format],
    extension: format === 'tiff' ? 'tif' : format,
    facts,
    notes,
  });
  switch (format) {
    case 'svg':
      return done(Buffer.from(sceneToSvg(scene), 'utf8'));
    case 'pdf':
      return done(await sceneToPdf(scene));
    case 'png':
      return done(rasterPng ?? (await sceneToPng(scene)));
    case 'tiff': {
      const png = rasterPng ?? (await sceneToPng(scene));
      if (options.cmyk) {
        notes.push(
          'Converted to CMYK with a generic press profile: colours shift, and transparency is flattened onto white. Ask your printer for their profile before final output.',
        );
      }
      return done(await pngToTiff(png, spec.print.dpi, options.cmyk ?? false));
    }
  }
}

function render2d(spec: ResolvedFigureSpec, datasets?: FigureDatasets): {
  scene: FigureScene;
  rasterPng: null;
  facts: Record<string, unknown>;
} {
  const scene = buildFigureScene(spec, datasets);
  const facts = Object.fromEntries(
    scene.metadata.facts.map((f) => [f.name, { value: f.value, unit: f.unit, printed: f.printed }]),
  );
  return { scene, rasterPng: null, facts };
}

async function render3d(
  spec: ResolvedFigureSpec,
  options: RenderOptions,
): Promise<{ scene: FigureScene; rasterPng: Buffer; facts: Record<string, unknown> }> {
  const r = await render3dPng(spec, { timeoutMs: options.timeoutMs });
  const { data } = await sharp(r.png).ensureAlpha().raw().toBuffer({ resolveWithObject: true });
  const image: SceneNode = {
    type: 'image',
    x: 0,
    y: 0,
    width: spec.print.widthMm,
    height: spec.print.heightMm,
    pixelWidth: r.widthPx,
    pixelHeight: r.heightPx,
    rgba: new Uint8Array(data.buffer, data.byteOffset, data.byteLength),
    role: '3d-raster',
  };
  const overlay = build3dOverlayNodes(spec, r.projection);
  const scene: FigureScene = {
    widthMm: spec.print.widthMm,
    heightMm: spec.print.heightMm,
    background: spec.print.background,
    dpi: spec.print.dpi,
    children: [image, ...overlay.nodes],
    metadata: { title: '', altText: '', facts: overlay.facts, notes: [...r.notes] },
  };
  // The raster itself gets the dpi in its metadata; the overlay's labels are drawn into it too,
  // so PNG and PDF show the same figure.
  const rasterPng = await sceneToPng(scene);
  return { scene, rasterPng, facts: { ...r.facts } };
}

/** PNG → TIFF with LZW compression and the dpi in the resolution tags. */
export async function pngToTiff(png: Buffer, dpi: number, cmyk: boolean): Promise<Buffer> {
  // sharp takes the resolution in pixels per millimetre and writes it in the unit asked for.
  const img = cmyk
    ? sharp(png).flatten({ background: '#ffffff' }).withIccProfile('cmyk')
    : sharp(png).withIccProfile('srgb');
  return img
    .tiff({ compression: 'lzw', xres: dpi / 25.4, yres: dpi / 25.4, resolutionUnit: 'inch' })
    .toBuffer();
}
