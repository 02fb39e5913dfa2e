// Development page for the 3D view: a few figures to switch between, with the view stored as the
// route would store it. Served by the Vite dev server only; not part of the build.
import { StrictMode, useState } from 'react';
import { createRoot } from 'react-dom/client';
import '../../../styles.css';
import { figureSpecSchema, type FigureSpecInput } from '../../../../shared/spec/figure-spec';
import { defaultHouseStyle } from '../../../../shared/spec/house-style';
import {
  resolveFigureSpec,
  type ResolvedFigureSpec,
} from '../../../../shared/spec/resolve-figure-spec';
import { OrbitalViewport } from '../components/orbital-viewport';

const examples: Record<string, FigureSpecInput> = {
  '2p_z isosurface': {
    schemaVersion: 1,
    state: { terms: [{ n: 2, l: 1, m: 0 }] },
    kind: { type: 'isosurface' },
    look: { showNodalSurfaces: true },
  },
  '3d_z² with outer surface': {
    schemaVersion: 1,
    state: { terms: [{ n: 3, l: 2, m: 0 }] },
    kind: { type: 'isosurface', outerSurface: { enclosed: 0.99, opacity: 0.25 } },
    system: { lengthUnit: 'angstrom' },
  },
  'sp³ hybrid': {
    schemaVersion: 1,
    state: {
      terms: [
        { n: 2, l: 0, m: 0 },
        { n: 2, l: 1, m: 1 },
        { n: 2, l: 1, m: -1 },
        { n: 2, l: 1, m: 0 },
      ],
    },
    kind: { type: 'isosurface' },
    system: { lengthUnit: 'pm' },
  },
  '3p_z cloud': {
    schemaVersion: 1,
    state: { terms: [{ n: 3, l: 1, m: 0 }] },
    kind: { type: 'cloud', points: 60000 },
  },
  '4f angular': {
    schemaVersion: 1,
    state: { terms: [{ n: 4, l: 3, m: -2 }] },
    kind: { type: 'angular' },
    look: { showNodalSurfaces: true },
  },
  'complex 2p, m = +1': {
    schemaVersion: 1,
    state: { terms: [{ n: 2, l: 1, m: 1, basis: 'complex' }] },
    kind: { type: 'isosurface' },
  },
};

const resolve = (input: FigureSpecInput): ResolvedFigureSpec =>
  resolveFigureSpec(figureSpecSchema.parse(input), defaultHouseStyle);

function Harness() {
  const names = Object.keys(examples);
  const initial = new URLSearchParams(location.search).get('figure') ?? names[0];
  const [name, setName] = useState(names.includes(initial) ? initial : names[0]);
  const [spec, setSpec] = useState(() => resolve(examples[name]));
  return (
    <main className="space-y-3 p-4">
      <label className="flex items-center gap-2 text-sm">
        Figure
        <select
          value={name}
          onChange={(e) => {
            setName(e.target.value);
            setSpec(resolve(examples[e.target.value]));
          }}
          className="rounded border border-slate-300 px-2 py-1"
        >
          {names.map((n) => (
            <option key={n}>{n}</option>
          ))}
        </select>
      </label>
      <OrbitalViewport spec={spec} onViewChange={(view) => setSpec((s) => ({ ...s, view }))} />
      <pre aria-label="Stored view" className="text-xs text-slate-500">
        {JSON.stringify(spec.view)}
      </pre>
    </main>
  );
}

createRoot(document.getElementById('root')!).render(
  <StrictMode>
    <Harness />
  </StrictMode>,
);
