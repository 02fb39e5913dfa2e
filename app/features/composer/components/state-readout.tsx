// What the figure shows, in numbers the code computed: per orbital its energy, node counts, ⟨r⟩
// and most probable radius; for 2D figures the values the figure prints; and the cautions.
import type { SceneFact } from '../../../../shared/figures/scene';
import type { StateFacts } from '../utils/state-facts';
import { OrbitalName } from './orbital-name';

const fmt = (v: number, digits = 4) =>
  Math.abs(v) >= 1e5 || (v !== 0 && Math.abs(v) < 1e-3)
    ? v.toExponential(3)
    : v.toPrecision(digits);

export function StateReadout({
  facts,
  sceneFacts,
  notes,
  showsState,
}: {
  facts: StateFacts | null;
  sceneFacts: readonly SceneFact[];
  notes: readonly string[];
  /** False for level diagrams, which do not draw the state. */
  showsState: boolean;
}) {
  const many = (facts?.terms.length ?? 0) > 1;
  return (
    <section aria-labelledby="composer-readout-title" className="space-y-3 text-sm">
      <h3 id="composer-readout-title" className="text-sm font-semibold text-stone-800">
        Read-out
      </h3>
      {showsState && facts ? (
        <table className="w-full text-left text-xs tabular-nums">
          <caption className="sr-only">Computed values for each orbital of the state</caption>
          <thead className="text-stone-600">
            <tr>
              <th scope="col" className="py-1 font-semibold">
                Orbital
              </th>
              {many ? (
                <th scope="col" className="font-semibold">
                  Share
                </th>
              ) : null}
              <th scope="col" className="font-semibold">
                Energy
              </th>
              <th scope="col" className="font-semibold">
                Nodes (radial / angular)
              </th>
              <th scope="col" className="font-semibold">
                ⟨r⟩
              </th>
              <th scope="col" className="font-semibold">
                Most probable r
              </th>
            </tr>
          </thead>
          <tbody className="text-stone-900">
            {facts.terms.map((t, i) => (
              <tr key={i} className="border-t border-stone-100">
                <th scope="row" className="py-1 font-semibold">
                  <OrbitalName label={t.label} />
                </th>
                {many ? <td>{(100 * t.share).toFixed(1)} %</td> : null}
                <td>
                  {fmt(t.energyEv)} eV{' '}
                  <span className="text-stone-600">({fmt(t.energyHartree)} Eₕ)</span>
                </td>
                <td>
                  {t.radialNodes} / {t.angularNodes}
                </td>
                <td>
                  {fmt(t.meanRadius)} {facts.unit}
                </td>
                <td>
                  {fmt(t.mostProbableRadius)} {facts.unit}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      ) : null}
      {showsState && facts && many ? (
        <p className="text-xs text-stone-700">
          Mean energy Σ|c|²E = {fmt(facts.meanEnergyEv)} eV.
          {facts.mixesEnergies
            ? ' The terms differ in energy, so the state changes with time.'
            : ''}
        </p>
      ) : null}
      {sceneFacts.length > 0 ? (
        <dl
          className="grid grid-cols-[1fr_auto] gap-x-4 gap-y-0.5 text-xs"
          aria-label="Values printed in the figure"
        >
          {sceneFacts.slice(0, 14).map((f) => (
            <div key={f.name} className="contents">
              <dt className="text-stone-600">{f.name}</dt>
              <dd className="text-right tabular-nums text-stone-900">{f.printed}</dd>
            </div>
          ))}
        </dl>
      ) : null}
      {notes.length > 0 ? (
        <div className="rounded-md border border-amber-300 bg-amber-50 p-2.5 text-xs text-amber-950">
          <p className="font-semibold">Where this figure could mislead</p>
          <ul className="mt-1 list-disc space-y-0.5 pl-4" aria-label="Cautions">
            {notes.map((n) => (
              <li key={n}>{n}</li>
            ))}
          </ul>
        </div>
      ) : null}
    </section>
  );
}
