// scripts/lobewright render as an author's Makefile runs it: a spec in, a print file out, no server.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import sharp from 'sharp';
import { describe, expect, it } from 'vitest';

const tool = fileURLToPath(new URL('../../../scripts/lobewright', import.meta.url));
const dir = mkdtempSync(path.join(tmpdir(), 'lw-cli-render-'));

const radialSpec = {
  schemaVersion: 1,
  state: { terms: [{ n: 2, l: 1, m: 0 }] },
  kind: { type: 'radial', curves: [{ n: 2, l: 1, quantity: 'r2R2' }] },
  print: { widthMm: 84, heightMm: 60, dpi: 600 },
};

function run(request: unknown): { status: number | null; stdout: Buffer } {
  const child = spawnSync(tool, ['render'], { input: JSON.stringify(request) });
  return { status: child.status, stdout: child.stdout };
}

describe('scripts/lobewright render', () => {
  it('when "out" is given, then the file is written there and a JSON summary names its checksum', () => {
    const out = path.join(dir, 'fig.png');
    const r = run({ spec: radialSpec, format: 'png', out });
    expect(r.status).toBe(0);
    const answer = JSON.parse(r.stdout.toString());
    expect(answer).toMatchObject({ out, format: 'png', bytes: readFileSync(out).length });
    expect(answer.sha256).toMatch(/^[0-9a-f]{64}$/);
  });

  it('when "out" is absent, then the bytes go to standard output (a PDF here)', () => {
    const r = run({ spec: radialSpec, format: 'pdf' });
    expect(r.status).toBe(0);
    expect(r.stdout.subarray(0, 5).toString()).toBe('%PDF-');
  });

  it('when the same request runs twice, then the bytes are identical and the PNG is 1984 × 1417 px at 600 dpi', async () => {
    const a = run({ spec: radialSpec, format: 'png' }).stdout;
    const b = run({ spec: radialSpec, format: 'png' }).stdout;
    expect(a.equals(b)).toBe(true);
    const m = await sharp(a).metadata();
    // 84 mm and 60 mm at 600 dpi: round(84 / 25.4 × 600) = 1984, round(60 / 25.4 × 600) = 1417
    expect([m.width, m.height, m.density]).toEqual([1984, 1417, 600]);
  });

  it('when the spec or the format is bad, then a JSON error names the field and the exit status is non-zero', () => {
    const bad = run({ spec: { ...radialSpec, state: { terms: [{ n: 1, l: 1, m: 0 }] } }, format: 'png' });
    expect(bad.status).not.toBe(0);
    expect(JSON.parse(bad.stdout.toString()).error.field).toBe('spec.state.terms.0.l');
    const fmt = run({ spec: radialSpec, format: 'gif' });
    expect(JSON.parse(fmt.stdout.toString()).error.field).toBe('format');
    const big = run({ spec: { ...radialSpec, print: { widthMm: 500, heightMm: 500, dpi: 1200 } }, format: 'png' });
    expect(JSON.parse(big.stdout.toString()).error.field).toBe('spec.print.widthMm');
  });
});
