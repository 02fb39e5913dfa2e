// Every saved revision of a figure, newest first, with who saved it, when, their note and which
// fields changed against the revision before.
// A revision can be opened to read what it held, compare it with the latest and restore it.
import { Fragment, useEffect, useRef, useState } from 'react';
import { Button } from '../../../components/ui/button';
import { ErrorPanel, Loading } from '../../../components/ui/status';
import { formatDateTime } from '../../../utils/format-date';
import { useRevisions } from '../api/get-revisions';
import type { Figure } from '../../../../shared/api/schemas';
import { describeChanges } from '../utils/changed-fields';
import { RevisionDetails } from './revision-details';

interface RevisionListProps {
  figure: Figure;
  canEdit: boolean;
}

export function RevisionList({ figure, canEdit }: RevisionListProps) {
  const { id: figureId, revision: currentRevision, approvedRevision } = figure;
  const revisions = useRevisions(figureId);
  const [open, setOpen] = useState<number | null>(null);

  // The figure moved on (someone saved, or this page did): fetch the list again, once per revision.
  const refetchedFor = useRef(currentRevision);
  const { data, refetch } = revisions;
  useEffect(() => {
    if (!data || data.some((r) => r.revision === currentRevision)) return;
    if (refetchedFor.current === currentRevision) return;
    refetchedFor.current = currentRevision;
    void refetch();
  }, [currentRevision, data, refetch]);

  if (revisions.isPending) return <Loading label="Loading revisions…" />;
  if (revisions.isError)
    return <ErrorPanel error={revisions.error} onRetry={() => void revisions.refetch()} />;

  const rows = [...revisions.data].sort((a, b) => b.revision - a.revision);
  const latestSpecHash = rows.find((r) => r.revision === currentRevision)?.specHash;
  const oldest = rows.at(-1)?.revision;
  return (
    <div className="overflow-x-auto">
      <table className="w-full border-collapse text-sm">
        <caption className="sr-only">Saved revisions, newest first</caption>
        <thead className="border-b border-stone-200 text-left text-stone-700">
          <tr>
            <th scope="col" className="py-2 pr-3 font-semibold">
              Revision
            </th>
            <th scope="col" className="py-2 pr-3 font-semibold">
              Saved by
            </th>
            <th scope="col" className="py-2 pr-3 font-semibold">
              When
            </th>
            <th scope="col" className="py-2 pr-3 font-semibold">
              Note
            </th>
            <th scope="col" className="py-2 pr-3 font-semibold">
              What changed
            </th>
            <th scope="col" className="py-2 font-semibold">
              <span className="sr-only">Details</span>
            </th>
          </tr>
        </thead>
        <tbody>
          {rows.map((r) => (
            <Fragment key={r.revision}>
              <tr className="border-b border-stone-100">
                <th scope="row" className="py-2 pr-3 text-left font-semibold tabular-nums">
                  {r.revision}
                  {r.revision === currentRevision && (
                    <span className="ml-2 text-xs font-normal text-stone-600">latest</span>
                  )}
                  {r.revision === approvedRevision && (
                    <span className="ml-2 text-xs font-semibold text-emerald-800">approved</span>
                  )}
                </th>
                <td className="py-2 pr-3">{r.authorName}</td>
                <td className="py-2 pr-3 whitespace-nowrap">{formatDateTime(r.createdAt)}</td>
                <td className="py-2 pr-3 text-stone-700">
                  {r.message || <span className="text-stone-500">—</span>}
                </td>
                <td className="py-2 pr-3 text-stone-700">
                  {describeChanges(r.changedFields, r.revision === oldest)}
                </td>
                <td className="py-2 text-right">
                  <Button
                    size="sm"
                    variant="quiet"
                    aria-expanded={open === r.revision}
                    aria-controls={`revision-${r.revision}`}
                    onClick={() => setOpen(open === r.revision ? null : r.revision)}
                  >
                    {open === r.revision ? 'Hide' : 'Show'}
                    <span className="sr-only"> revision {r.revision}</span>
                  </Button>
                </td>
              </tr>
              {open === r.revision && (
                <tr id={`revision-${r.revision}`} className="border-b border-stone-100 bg-stone-50">
                  <td colSpan={6} className="p-4">
                    <RevisionDetails
                      figure={figure}
                      revision={r.revision}
                      latestSpecHash={latestSpecHash}
                      canEdit={canEdit}
                    />
                  </td>
                </tr>
              )}
            </Fragment>
          ))}
        </tbody>
      </table>
    </div>
  );
}
