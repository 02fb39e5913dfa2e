// Upload of a Lobewright bundle, then its report: what was imported, renumbered or skipped; or,
// when refused, every field at fault (nothing was changed then).
import { useState, type FormEvent } from 'react';
import { Link } from 'react-router';
import { Button } from '../../../components/ui/button';
import { FormAlert } from '../../../components/ui/status';
import { isApiError } from '../../../lib/api-client';
import { MAX_BUNDLE_BYTES, type ImportReport } from '../../../../shared/api/bundle';
import { useImportBundle, type ImportTarget } from '../api/import-bundle';

function Report({ report, target }: { report: ImportReport; target: ImportTarget }) {
  const n = report.imported.length;
  return (
    <div
      role="status"
      className="space-y-2 rounded-md border border-emerald-200 bg-emerald-50 px-3 py-2 text-sm text-emerald-900"
    >
      <p className="font-semibold">
        Imported {n} {n === 1 ? 'figure' : 'figures'}
        {report.datasets > 0 &&
          ` and ${report.datasets} data ${report.datasets === 1 ? 'set' : 'sets'}`}
        .
      </p>
      {report.renamed.length > 0 && (
        <>
          <p>Renumbered, because the project already used the number:</p>
          <ul className="list-disc pl-5">
            {report.renamed.map((r) => (
              <li key={r.to}>
                {r.from} → {r.to} ({r.title})
              </li>
            ))}
          </ul>
        </>
      )}
      {report.skipped.length > 0 && (
        <>
          <p>Skipped:</p>
          <ul className="list-disc pl-5">
            {report.skipped.map((s) => (
              <li key={`${s.number}-${s.title}`}>
                {s.number} {s.title}: {s.reason}
              </li>
            ))}
          </ul>
        </>
      )}
      {target === 'new project' && (
        <p>
          <Link
            to={`/projects/${report.projectId}`}
            className="font-semibold underline underline-offset-2"
          >
            Open the new project
          </Link>
        </p>
      )}
    </div>
  );
}

export function ImportBundleForm({
  target,
  onImported,
}: {
  target: ImportTarget;
  onImported: (report: ImportReport) => void;
}) {
  const [file, setFile] = useState<File | null>(null);
  const upload = useImportBundle(target, onImported);
  const tooLarge = file !== null && file.size > MAX_BUNDLE_BYTES;
  const fields = isApiError(upload.error) ? Object.entries(upload.error.fields) : [];

  function submit(e: FormEvent) {
    e.preventDefault();
    if (file && !tooLarge) upload.mutate(file);
  }

  return (
    <form onSubmit={submit} className="space-y-3" noValidate>
      <div className="space-y-1">
        <label
          htmlFor={`bundle-file-${target}`}
          className="block text-sm font-semibold text-stone-800"
        >
          Bundle file (.lobewright.json)
        </label>
        <input
          id={`bundle-file-${target}`}
          type="file"
          accept=".json,application/json"
          aria-invalid={tooLarge || upload.isError || undefined}
          onChange={(e) => {
            setFile(e.target.files?.[0] ?? null);
            upload.reset();
          }}
          className="block text-sm"
        />
        <p className="text-xs text-stone-600">
          Figures, captions, alt text and data from another project; at most 5 MB. A file with any
          invalid figure is refused as a whole.
        </p>
      </div>
      {tooLarge && <FormAlert message="this file is larger than 5 MB" />}
      {upload.isError && (
        <div
          role="alert"
          className="rounded-md border border-red-200 bg-red-50 px-3 py-2 text-sm text-red-800"
        >
          <p className="font-semibold">
            {fields.length
              ? 'The bundle was not imported; nothing was changed.'
              : upload.error.message}
          </p>
          {fields.length > 0 && (
            <ul className="mt-1 list-disc pl-5">
              {fields.map(([field, reason]) => (
                <li key={field}>
                  <code>{field}</code>: {reason}
                </li>
              ))}
            </ul>
          )}
        </div>
      )}
      {upload.isSuccess && <Report report={upload.data} target={target} />}
      <Button type="submit" variant="primary" busy={upload.isPending} disabled={!file || tooLarge}>
        {upload.isPending ? 'Importing…' : 'Import'}
      </Button>
    </form>
  );
}
