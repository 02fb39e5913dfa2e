// What the figure shows, in numbers the code computed: enclosed fraction achieved, level, node
// counts, triangles or points, and the notes where the figure could mislead.
import type { OrbitalFacts } from '../utils/orbital-geometry';

function Row({ term, children }: { term: string; children: React.ReactNode }) {
  return (
    <div className="flex justify-between gap-4">
      <dt className="text-slate-500">{term}</dt>
      <dd className="text-right tabular-nums text-slate-800">{children}</dd>
    </div>
  );
}

const pct = (f: number): string => `${(100 * f).toFixed(2)} %`;
const SUPERSCRIPT: Record<string, string> = {
  '-': '⁻',
  '0': '⁰',
  '1': '¹',
  '2': '²',
  '3': '³',
  '4': '⁴',
  '5': '⁵',
  '6': '⁶',
  '7': '⁷',
  '8': '⁸',
  '9': '⁹',
};
/** 4 significant digits, as a × 10ⁿ below 0.01. */
function number(value: number): string {
  if (value === 0 || Math.abs(value) >= 0.01) return value.toPrecision(4);
  const [mantissa, exponent] = value.toExponential(3).split('e');
  return `${mantissa} × 10${String(Number(exponent)).replace(/./g, (c) => SUPERSCRIPT[c] ?? c)}`;
}

export function OrbitalReadout({
  facts,
  notes,
}: {
  facts: OrbitalFacts;
  notes: readonly string[];
}) {
  return (
    <section aria-label="Figure read-out" className="text-xs">
      <dl className="space-y-0.5">
        <Row term="Orbital">{facts.label}</Row>
        {facts.enclosed ? (
          <Row term="Enclosed (asked / achieved)">
            {pct(facts.enclosed.requested)} / {pct(facts.enclosed.achieved)}
          </Row>
        ) : null}
        {facts.densityLevel !== null ? (
          <Row term="Level |ψ|²">{number(facts.densityLevel)} bohr⁻³</Row>
        ) : null}
        {facts.psiLevel !== null ? (
          <Row term="Level |ψ|">{number(facts.psiLevel)} bohr⁻³ᐟ²</Row>
        ) : null}
        {facts.outer ? (
          <Row term="Outer surface">
            {pct(facts.outer.requested)} / {pct(facts.outer.achieved)}
          </Row>
        ) : null}
        {facts.grid ? (
          <Row term="Grid">
            {facts.grid.pointsPerAxis}³, ±{facts.grid.halfWidthBohr} bohr
          </Row>
        ) : null}
        {facts.triangles.total > 0 ? (
          <Row term="Triangles">{facts.triangles.total.toLocaleString('en-GB')}</Row>
        ) : null}
        {facts.points !== null ? (
          <Row term="Points">{facts.points.toLocaleString('en-GB')}</Row>
        ) : null}
        {facts.nodes ? (
          <Row term="Nodes (radial / angular)">
            {facts.nodes.radial} / {facts.nodes.angular}
          </Row>
        ) : null}
      </dl>
      {notes.length > 0 ? (
        <ul className="mt-2 space-y-1 text-amber-800" aria-label="Notes on this figure">
          {notes.map((n) => (
            <li key={n}>{n}</li>
          ))}
        </ul>
      ) : null}
    </section>
  );
}
