// An export run's progress in words and numbers for its progress bar.
import type { ExportRun } from '../../../../shared/api/schemas';

export function runIsActive(run: Pick<ExportRun, 'status'>): boolean {
  return run.status === 'queued' || run.status === 'running';
}

/** Whole per cent of figures done, 0 when the run has no figures yet. */
export function percentDone(run: Pick<ExportRun, 'done' | 'total'>): number {
  if (run.total <= 0) return 0;
  return Math.min(100, Math.floor((100 * run.done) / run.total));
}

/** "3 of 8 figures", or "1 of 1 figure". */
export function progressText(run: Pick<ExportRun, 'done' | 'total'>): string {
  return `${run.done} of ${run.total} ${run.total === 1 ? 'figure' : 'figures'}`;
}

const units = ['bytes', 'kB', 'MB', 'GB'] as const;

/** A file size in SI units as people read them: "812 bytes", "2.4 MB". */
export function formatBytes(bytes: number): string {
  let value = bytes;
  let unit = 0;
  while (value >= 1000 && unit < units.length - 1) {
    value /= 1000;
    unit += 1;
  }
  const digits = unit === 0 || value >= 100 ? 0 : 1;
  return `${value.toFixed(digits)} ${units[unit]}`;
}
