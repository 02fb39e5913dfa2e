// The committed fixtures are what scripts/fixtures/orbital-values.py writes: re-run it with Debian's
// python3 (mpmath required; SciPy used as a cross-check when present) and compare every file byte for byte.
// There is no skip: without python3 + mpmath this test fails and says what to install.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';

const root = fileURLToPath(new URL('../../../', import.meta.url));
const committed = join(root, 'tests/fixtures');
const out = mkdtempSync(join(tmpdir(), 'lobewright-fixtures-'));
afterAll(() => rmSync(out, { recursive: true, force: true }));

function pythonWithMpmath(): string | null {
  for (const python of ['/usr/bin/python3', 'python3']) {
    const probe = spawnSync(python, ['-c', 'import mpmath'], { encoding: 'utf8' });
    if (probe.status === 0) return python;
  }
  return null;
}

function listFiles(dir: string, prefix = ''): string[] {
  return readdirSync(join(dir, prefix), { withFileTypes: true }).flatMap((e) =>
    e.isDirectory() ? listFiles(dir, join(prefix, e.name)) : [join(prefix, e.name)],
  );
}

describe('scripts/fixtures/orbital-values.py', () => {
  it(
    'when re-run into a temporary folder, then it reproduces every committed fixture exactly',
    { timeout: 180_000 },
    () => {
      const python = pythonWithMpmath();
      if (python === null) {
        expect.fail(
          'python3 with mpmath is required: install Debian packages python3-mpmath python3-scipy (scripts/test does)',
        );
      }
      const run = spawnSync(
        python,
        [join(root, 'scripts/fixtures/orbital-values.py'), '--out', out],
        { encoding: 'utf8' },
      );
      expect(run.status, run.stderr).toBe(0);
      const files = listFiles(committed).filter(
        (f) => f.endsWith('.json') && generatedBy(join(committed, f)),
      );
      expect(files.length).toBe(6);
      expect(listFiles(out).sort()).toEqual([...files].sort());
      for (const file of files) {
        expect(readFileSync(join(out, file), 'utf8'), file).toBe(
          readFileSync(join(committed, file), 'utf8'),
        );
      }
    },
  );
});

function generatedBy(path: string): boolean {
  return readFileSync(path, 'utf8').includes('"generator": "scripts/fixtures/orbital-values.py"');
}
