// Two revisions side by side: each as it prints (the server's PNG of that revision) and every
// setting in a table, with the settings that differ between them marked.
import { useMemo } from 'react';
import type { Figure, Revision } from '../../../../shared/api/schemas';
import { changedPaths } from '../../../../shared/spec/changed-paths';
import { flattenSettings } from '../../../../shared/spec/flatten-settings';

const editable = (r: Pick<Revision, 'number' | 'title' | 'caption' | 'altText' | 'spec'>) => ({
  number: r.number,
  title: r.title,
  caption: r.caption,
  altText: r.altText,
  spec: r.spec,
});

export function RevisionSideBySide({ figure, older }: { figure: Figure; older: Revision }) {
  const { rows, changed } = useMemo(() => {
    const before = editable(older);
    const after = editable(figure);
    const changedSet = new Set(changedPaths(before, after));
    const left = new Map(flattenSettings(before).map((r) => [r.path, r.value]));
    const right = new Map(flattenSettings(after).map((r) => [r.path, r.value]));
    const paths = [...new Set([...left.keys(), ...right.keys()])].sort();
    const isChanged = (p: string) => [...changedSet].some((c) => p === c || p.startsWith(`${c}.`));
    return {
      rows: paths.map((p) => ({ path: p, before: left.get(p) ?? '—', after: right.get(p) ?? '—', changed: isChanged(p) })),
      changed: changedSet.size,
    };
  }, [figure, older]);
  const image = (revision: number) => `/api/figures/${figure.id}/render?format=png&revision=${revision}`;
  return (
    <section aria-label={`Revision ${older.revision} beside revision ${figure.revision}`} className="space-y-3">
      <div className="grid gap-4 sm:grid-cols-2">
        {[older.revision, figure.revision].map((rev) => (
          <figure key={rev} className="rounded border border-stone-200 bg-[conic-gradient(#f5f5f4_25%,white_0_50%,#f5f5f4_0_75%,white_0)] bg-[length:16px_16px] p-2">
            <img src={image(rev)} alt={`Revision ${rev} as it prints`} className="mx-auto max-h-72 w-auto" loading="lazy" />
            <figcaption className="mt-1 text-center text-xs text-stone-700">
              Revision {rev}
              {rev === figure.revision ? ' (latest)' : ''}
            </figcaption>
          </figure>
        ))}
      </div>
      <p className="text-sm text-stone-700">
        {changed === 0 ? 'No settings differ.' : `${changed} setting${changed === 1 ? '' : 's'} differ; marked below.`}
      </p>
      <div className="max-h-96 overflow-auto rounded border border-stone-200">
        <table className="w-full text-left text-xs">
          <caption className="sr-only">Settings of revision {older.revision} and revision {figure.revision}</caption>
          <thead className="sticky top-0 bg-stone-50">
            <tr>
              <th scope="col" className="px-2 py-1">Setting</th>
              <th scope="col" className="px-2 py-1">Revision {older.revision}</th>
              <th scope="col" className="px-2 py-1">Revision {figure.revision}</th>
            </tr>
          </thead>
          <tbody>
            {rows.map((r) => (
              <tr key={r.path} className={r.changed ? 'bg-amber-50 font-semibold text-amber-950' : 'text-stone-700'}>
                <th scope="row" className="px-2 py-0.5 font-mono font-normal">
                  {r.path}
                  {r.changed && ' '}
                  {r.changed && <span className="ml-1 rounded bg-amber-200 px-1 text-[10px] uppercase">changed</span>}
                </th>
                <td className="break-all px-2 py-0.5 font-mono">{r.before}</td>
                <td className="break-all px-2 py-0.5 font-mono">{r.after}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </section>
  );
}
