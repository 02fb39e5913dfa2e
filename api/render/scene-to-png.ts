/**
 * Scene → PNG: the scene's SVG with every text run turned into glyph outlines (./fonts), rendered
 * by sharp (libvips + librsvg) at exactly round(mm / 25.4 × dpi) pixels, sRGB, with the dpi in the
 * pHYs chunk. Transparent or white as the scene says. Same scene → same bytes (no time chunk).
 */
import sharp from 'sharp';
import type { FigureScene } from '../../shared/figures/scene';
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

export async function sceneToPng(scene: FigureScene): Promise<Buffer> {
  const size = pixelSize(scene);
  if (size.width > MAX_PNG_SIDE || size.height > MAX_PNG_SIDE) {
    throw new Error(
      `print: ${size.width} × ${size.height} px exceeds the largest PNG side of ${MAX_PNG_SIDE} px; lower the dpi or the size`,
    );
  }
  const svg = sceneToSvg(scene, { glyphOutlines, pixelSize: size });
  // librsvg treats px as device pixels at 72 dpi, so the root's pixel size is the output size.
  return sharp(Buffer.from(svg), { density: 72, limitInputPixels: false })
    .withIccProfile('srgb')
    .withMetadata({ density: scene.dpi })
    .png({ compressionLevel: 6, adaptiveFiltering: false, palette: false })
    .toBuffer();
}
