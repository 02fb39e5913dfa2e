// The SVG writer: a standalone document in mm that an independent parser (librsvg in sharp) reads,
// the same bytes for the same scene, text as <text> runs or as glyph outlines.
import sharp from 'sharp';
import { describe, expect, it } from 'vitest';
import { glyphOutlines } from '../../../api/render/fonts';
import { encodePng } from '../../../shared/figures/png-encode';
import { circleCommands, type FigureScene } from '../../../shared/figures/scene';
import { sceneToSvg } from '../../../shared/figures/scene-to-svg';

function sampleScene(): FigureScene {
  const rgba = new Uint8Array(4 * 4 * 3);
  for (let i = 0; i < 12; i++) rgba.set([i * 20, 100, 200 - i * 10, 255], i * 4);
  return {
    widthMm: 40,
    heightMm: 30,
    background: 'white',
    dpi: 300,
    children: [
      { type: 'image', x: 5, y: 5, width: 16, height: 12, pixelWidth: 4, pixelHeight: 3, rgba },
      {
        type: 'group',
        clip: { x: 0, y: 0, width: 30, height: 30 },
        children: [
          {
            type: 'path',
            commands: circleCommands(20, 15, 5),
            stroke: { colour: '#c2410c', widthPt: 1, dashPt: [2, 1] },
          },
        ],
      },
      {
        type: 'text',
        x: 20,
        y: 25,
        sizePt: 8,
        anchor: 'middle',
        colour: '#262626',
        runs: [
          { text: '3d', shift: 'base' },
          { text: 'z²', shift: 'sub', italic: true },
          { text: ' <&> ', shift: 'base' },
        ],
      },
    ],
    metadata: { title: 'A test "scene"', altText: 'circle & text', facts: [], notes: [] },
  };
}

describe('scene to SVG', () => {
  it('when written twice, then the strings are identical and sized in mm', () => {
    const a = sceneToSvg(sampleScene());
    expect(a).toBe(sceneToSvg(sampleScene()));
    expect(a).toContain('width="40mm" height="30mm" viewBox="0 0 40 30"');
    expect(a).toContain("font-family:'Lobewright Sans'");
    expect(a).toContain('&lt;&amp;&gt;');
    expect(a).toContain('data:image/png;base64,');
  });

  it('when parsed by librsvg, then it renders at the size it states', async () => {
    const meta = await sharp(
      Buffer.from(
        sceneToSvg(sampleScene(), { glyphOutlines, pixelSize: { width: 400, height: 300 } }),
      ),
    ).metadata();
    expect([meta.width, meta.height]).toEqual([400, 300]);
    const plain = await sharp(Buffer.from(sceneToSvg(sampleScene())), { density: 72 }).metadata();
    expect(plain.format).toBe('svg');
  });

  it('when text is outlined, then no <text> element remains', () => {
    const svg = sceneToSvg(sampleScene(), { glyphOutlines });
    expect(svg).not.toContain('<text');
    expect(svg).toMatch(/<g transform="translate\(20 25\)" fill="#262626"><path/);
  });

  it('when a PNG is encoded, then an independent decoder (libspng in sharp) reads back the same pixels and dpi', async () => {
    const w = 5;
    const h = 4;
    const rgba = new Uint8Array(w * h * 4).map((_, i) => (i * 37) % 256);
    const png = encodePng(w, h, rgba, { dpi: 600 });
    const { data, info } = await sharp(png).raw().toBuffer({ resolveWithObject: true });
    expect([info.width, info.height, info.channels]).toEqual([w, h, 4]);
    expect(Buffer.compare(Buffer.from(data), Buffer.from(rgba))).toBe(0);
    expect((await sharp(png).metadata()).density).toBe(600);
  });
});
