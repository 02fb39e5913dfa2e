// One export run: what it exports, who started it and when, a progress bar (figures done of total,
// the figure being rendered now), the errors met, and the bundle to download once it succeeded.
import type { ExportRun } from '../../../../shared/api/schemas';
import { buttonClasses } from '../../../components/ui/button';
import { cn } from '../../../utils/cn';
import { formatDateTime } from '../../../utils/format-date';
import { exportBundleUrl } from '../api/export-bundle-url';
import { useExportRun } from '../api/get-export-run';
import { formatBytes, percentDone, progressText, runIsActive } from '../utils/run-progress';

const statusWords: Record<ExportRun['status'], string> = {
  queued: 'Queued',
  running: 'Running',
  succeeded: 'Finished',
  failed: 'Failed',
};

const statusTones: Record<ExportRun['status'], string> = {
  queued: 'bg-stone-100 text-stone-800 ring-stone-300',
  running: 'bg-accent-50 text-accent-800 ring-accent-200',
  succeeded: 'bg-emerald-50 text-emerald-900 ring-emerald-300',
  failed: 'bg-red-50 text-red-900 ring-red-300',
};

const selectionWords: Record<string, string> = {
  all: 'All figures',
  approved: 'Approved figures',
  selected: 'Chosen figures',
};

export function ExportRunItem({ run: listed }: { run: ExportRun }) {
  const query = useExportRun(listed.id, listed);
  const run = query.data ?? listed;
  const active = runIsActive(run);
  const percent = percentDone(run);
  const titleId = `export-run-${run.id}`;

  return (
    <li>
      <article
        aria-labelledby={titleId}
        className="space-y-3 rounded-xl border border-stone-200 bg-white p-4"
      >
        <div className="flex flex-wrap items-baseline justify-between gap-2">
          <h3 id={titleId} className="font-semibold">
            Export {run.id}: {selectionWords[run.selection] ?? run.selection},{' '}
            {run.formats.map((f) => f.toUpperCase()).join(', ')}
          </h3>
          <span
            className={cn(
              'rounded-full px-2 py-0.5 text-xs font-semibold ring-1 ring-inset',
              statusTones[run.status],
            )}
          >
            {statusWords[run.status]}
          </span>
        </div>
        <p className="text-sm text-stone-600">
          Started by {run.startedBy}, {formatDateTime(run.createdAt)}
          {run.finishedAt && <>; finished {formatDateTime(run.finishedAt)}</>}
        </p>

        <div className="space-y-1">
          <div
            role="progressbar"
            aria-labelledby={titleId}
            aria-valuemin={0}
            aria-valuemax={run.total}
            aria-valuenow={run.done}
            aria-valuetext={progressText(run)}
            className="h-2.5 overflow-hidden rounded-full bg-stone-200"
          >
            <div
              className={cn(
                'h-full rounded-full',
                run.status === 'failed' ? 'bg-red-600' : 'bg-accent-600',
              )}
              style={{ width: `${percent}%` }}
            />
          </div>
          <p className="text-sm text-stone-700" aria-live="polite">
            {progressText(run)} done
            {active && run.currentItem && <> · now rendering {run.currentItem}</>}
            {run.status === 'queued' && <> · waiting for the export worker</>}
          </p>
        </div>

        {run.errors.length > 0 && (
          <div
            role={run.status === 'failed' ? 'alert' : undefined}
            className="rounded-md border border-red-200 bg-red-50 px-3 py-2 text-sm text-red-900"
          >
            <p className="font-semibold">
              {run.status === 'failed'
                ? 'The export failed:'
                : `${run.errors.length} ${run.errors.length === 1 ? 'problem' : 'problems'}:`}
            </p>
            <ul className="mt-1 list-disc space-y-0.5 pl-5">
              {run.errors.map((e, i) => (
                <li key={i}>
                  <span className="font-semibold">{e.figure}</span>: {e.message}
                </li>
              ))}
            </ul>
          </div>
        )}
        {run.status === 'failed' && run.errors.length === 0 && (
          <p role="alert" className="text-sm text-red-800">
            The export failed without naming a figure; start it again, and ask an administrator to
            look at the server log if it fails again.
          </p>
        )}

        {run.status === 'succeeded' && run.bundle && (
          <div className="flex flex-wrap items-center gap-3">
            <a
              href={exportBundleUrl(run.id)}
              download={run.bundle.filename}
              className={buttonClasses('primary', 'sm')}
            >
              Download {run.bundle.filename} ({formatBytes(run.bundle.size)})
            </a>
            <span className="font-mono text-xs break-all text-stone-500" title="SHA-256 of the ZIP">
              SHA-256 {run.bundle.sha256.slice(0, 16)}…
            </span>
          </div>
        )}
      </article>
    </li>
  );
}
