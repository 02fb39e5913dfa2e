/**
 * Scene → PNG: the scene's SVG with every text run turned into glyph outlines (./fonts), rendered
 * by sharp (libvips + librsvg) at exactly round(mm / 25.4 × dpi) pixels, sRGB, with the dpi in the
 * pHYs chunk. Transparent or white as the scene says. Same scene → same bytes (no time chunk).
 */
import sharp from 'sharp';
import type { FigureScene, SceneNode } from '../../shared/figures/scene';
import { sceneToSvg } from '../../shared/figures/scene-to-svg';
import { glyphOutlines } from './fonts';

/** Pixel size of a figure printed at its dpi. */
export function pixelSize(scene: Pick<FigureScene, 'widthMm' | 'heightMm' | 'dpi'>): {
  width: number;
  height: number;
} {
  return {
    width: Math.round((scene.widthMm / 25.4) * scene.dpi),
    height: Math.round((scene.heightMm / 25.4) * scene.dpi),
  };
}

/** Largest PNG side Lobewright renders (500 mm at 1200 dpi would be 23 622 px). */
export const MAX_PNG_SIDE = 12_000;

/** Offset in pixels when an image sits exactly on the pixel grid at one image pixel per output pixel. */
function pixelAligned(node: SceneNode, dpi: number): { left: number; top: number } | null {
  if (node.type !== 'image') return null;
  const perMm = dpi / 25.4;
  const left = node.x * perMm;
  const top = node.y * perMm;
  const onGrid = (v: number): boolean => Math.abs(v - Math.round(v)) < 1e-6;
  if (!onGrid(left) || !onGrid(top)) return null;
  if (
    Math.abs(node.width * perMm - node.pixelWidth) > 1e-6 ||
    Math.abs(node.height * perMm - node.pixelHeight) > 1e-6
  )
    return null;
  return { left: Math.round(left), top: Math.round(top) };
}

export async function sceneToPng(scene: FigureScene): Promise<Buffer> {
  const size = pixelSize(scene);
  if (size.width > MAX_PNG_SIDE || size.height > MAX_PNG_SIDE) {
    throw new Error(
      `print: ${size.width} × ${size.height} px exceeds the largest PNG side of ${MAX_PNG_SIDE} px; lower the dpi or the size`,
    );
  }
  // A raster that lies under everything else on whole pixels (a slice's colour field) is copied
  // straight into the page instead of travelling through a PNG data URI and librsvg.
  const first = scene.children[0];
  const aligned = first ? pixelAligned(first, scene.dpi) : null;
  const vectorScene: FigureScene = aligned
    ? { ...scene, background: 'transparent', children: scene.children.slice(1) }
    : scene;
  // librsvg treats px as device pixels at 72 dpi, so the root's pixel size is the output size.
  const svg = Buffer.from(sceneToSvg(vectorScene, { glyphOutlines, pixelSize: size }));
  let page: sharp.Sharp;
  if (aligned && first.type === 'image') {
    const background =
      scene.background === 'white'
        ? { r: 255, g: 255, b: 255, alpha: 1 }
        : { r: 0, g: 0, b: 0, alpha: 0 };
    page = sharp({
      create: { width: size.width, height: size.height, channels: 4, background },
    }).composite([
      {
        input: Buffer.from(first.rgba.buffer, first.rgba.byteOffset, first.rgba.byteLength),
        raw: { width: first.pixelWidth, height: first.pixelHeight, channels: 4 },
        left: aligned.left,
        top: aligned.top,
      },
      { input: svg, density: 72, left: 0, top: 0 },
    ]);
    // Composite needs a materialised page before encoding: render to raw, then encode once.
    const { data, info } = await page.raw().toBuffer({ resolveWithObject: true });
    page = sharp(data, { raw: { width: info.width, height: info.height, channels: 4 } });
  } else {
    page = sharp(svg, { density: 72, limitInputPixels: false });
  }
  return page
    .withIccProfile('srgb')
    .withMetadata({ density: scene.dpi })
    .png({ compressionLevel: 6, adaptiveFiltering: false, palette: false })
    .toBuffer();
}
