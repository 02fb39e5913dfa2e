// The project's uploaded data sets: what each holds, in which units it came, its r range, and
// (for editors) deleting one no figure draws.
import { useState } from 'react';
import { Button } from '../../../components/ui/button';
import { ErrorPanel, FormAlert, Loading } from '../../../components/ui/status';
import { formatDateTime } from '../../../utils/format-date';
import type { DatasetSummary } from '../../../../shared/api/datasets';
import { useDeleteDataset } from '../api/delete-dataset';
import { useDatasets } from '../api/get-datasets';

const QUANTITY = { R: 'R', r2R2: 'r²R²', potential: 'V' } as const;
const range = (d: DatasetSummary) => `${d.rMinBohr.toPrecision(3)} – ${d.rMaxBohr.toPrecision(3)}`;

export function DatasetList({ projectId, canEdit }: { projectId: number; canEdit: boolean }) {
  const datasets = useDatasets(projectId);
  const remove = useDeleteDataset(projectId);
  const [confirming, setConfirming] = useState<number | null>(null);

  if (datasets.isPending) return <Loading label="Loading data sets…" />;
  if (datasets.isError)
    return <ErrorPanel error={datasets.error} onRetry={() => void datasets.refetch()} />;
  if (datasets.data.length === 0)
    return <p className="text-sm text-stone-600">No data uploaded yet.</p>;

  return (
    <div className="space-y-3">
      {remove.isError && <FormAlert message={remove.error.message} />}
      <table className="w-full text-left text-sm">
        <caption className="sr-only">Uploaded data sets</caption>
        <thead className="border-b border-stone-200 text-stone-600">
          <tr>
            <th scope="col" className="py-2 pr-3">
              Name
            </th>
            <th scope="col" className="py-2 pr-3">
              Id
            </th>
            <th scope="col" className="py-2 pr-3">
              Quantity
            </th>
            <th scope="col" className="py-2 pr-3">
              Uploaded in
            </th>
            <th scope="col" className="py-2 pr-3">
              Points
            </th>
            <th scope="col" className="py-2 pr-3">
              r (bohr)
            </th>
            <th scope="col" className="py-2 pr-3">
              Uploaded
            </th>
            {canEdit && (
              <th scope="col" className="py-2">
                <span className="sr-only">Actions</span>
              </th>
            )}
          </tr>
        </thead>
        <tbody>
          {datasets.data.map((d) => (
            <tr key={d.id} className="border-b border-stone-100">
              <th scope="row" className="py-2 pr-3 font-semibold">
                {d.name}
              </th>
              <td className="py-2 pr-3 tabular-nums">{d.id}</td>
              <td className="py-2 pr-3">{QUANTITY[d.quantity]}</td>
              <td className="py-2 pr-3">
                {d.rUnit}, {d.valueUnit}
              </td>
              <td className="py-2 pr-3 tabular-nums">{d.points}</td>
              <td className="py-2 pr-3 tabular-nums">{range(d)}</td>
              <td className="py-2 pr-3">
                {d.createdBy}, {formatDateTime(d.createdAt)}
              </td>
              {canEdit && (
                <td className="py-2 text-right">
                  {confirming === d.id ? (
                    <Button
                      size="sm"
                      variant="danger"
                      busy={remove.isPending}
                      onClick={() => remove.mutate(d.id, { onSettled: () => setConfirming(null) })}
                    >
                      Delete “{d.name}” for good
                    </Button>
                  ) : (
                    <Button
                      size="sm"
                      variant="quiet"
                      onClick={() => {
                        remove.reset();
                        setConfirming(d.id);
                      }}
                    >
                      Delete
                    </Button>
                  )}
                </td>
              )}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
