// PDF output checked with poppler-utils (pdfinfo, pdffonts, pdftotext), independent of pdfkit:
// page size to 0.01 pt, Inter embedded as subsets, labels found as text, same spec → same bytes.
import { execFileSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { sceneToPdf } from '../../../api/render/scene-to-pdf';
import { buildFigureScene } from '../../../shared/figures/build-figure-scene';
import { resolved } from '../figures/figure-test-helpers';

const spec = resolved({
  schemaVersion: 1,
  state: { terms: [{ n: 2, l: 1, m: 0 }] },
  kind: {
    type: 'radial',
    curves: [
      { n: 2, l: 0, quantity: 'r2R2' },
      { n: 2, l: 1, quantity: 'r2R2' },
    ],
  },
  print: { widthMm: 84, heightMm: 61.5, dpi: 600 },
});

let file = '';
let bytes: Buffer;

beforeAll(async () => {
  bytes = await sceneToPdf(buildFigureScene(spec));
  file = join(mkdtempSync(join(tmpdir(), 'lw-pdf-')), 'figure.pdf');
  writeFileSync(file, bytes);
});

describe('scene to PDF', () => {
  it('when printed at 84 × 61.5 mm, then the page is 238.11 × 174.33 pt (mm / 25.4 × 72)', () => {
    const info = execFileSync('pdfinfo', [file], { encoding: 'utf8' });
    const match = /Page size:\s+([\d.]+) x ([\d.]+) pts/.exec(info);
    expect(match).not.toBeNull();
    expect(Math.abs(Number(match?.[1]) - (84 / 25.4) * 72)).toBeLessThan(0.01);
    expect(Math.abs(Number(match?.[2]) - (61.5 / 25.4) * 72)).toBeLessThan(0.01);
    expect(info).toMatch(/Title:\s+Radial plot of 2s, 2p/);
    expect(info).not.toMatch(/CreationDate/);
  });

  it('when fonts are listed, then every face used is Inter, embedded and subset', () => {
    const rows = execFileSync('pdffonts', [file], { encoding: 'utf8' }).trim().split('\n').slice(2);
    expect(rows.length).toBeGreaterThanOrEqual(2);
    for (const row of rows)
      expect(row).toMatch(/^[A-Z]{6}\+Inter-\S+\s+CID Type 0C\s+Identity-H\s+yes yes yes/);
  });

  it('when text is extracted, then axis titles, legend and the computed annotations are there', () => {
    const text = execFileSync('pdftotext', [file, '-'], { encoding: 'utf8' });
    for (const label of ['r / bohr', 'bohr−1', '2s', '2p', 'mp = 4.00 bohr', '2.00 bohr'])
      expect(text).toContain(label);
  });

  it('when rendered twice, then the bytes are identical', async () => {
    const again = await sceneToPdf(buildFigureScene(spec));
    expect(Buffer.compare(again, bytes)).toBe(0);
  });
});
