/**
 * Parser of a tabulated potential in CSV (pure TypeScript, no library): a header naming the two
 * columns with their units, then one "r,V" pair per line.
 *
 * Header: `r_<unit>,V_<unit>` with r in bohr | angstrom | pm and V in hartree | eV, e.g.
 * `r_bohr,V_hartree` or `r_angstrom,V_eV`. Blank lines and lines starting with # are skipped.
 * Rows: two finite numbers; r ≥ 0 and strictly increasing; at least MIN_POINTS rows. Errors throw
 * OrbitalInputError with field "<field>" and a 1-based line number in the reason.
 * Values are converted to bohr and hartree with the CODATA 2022 constants of shared/physics/units.
 */
import { OrbitalInputError } from '../physics/orbital-input-error';
import { angstromToBohr, evToHartree, pmToBohr } from '../physics/units';

export const MIN_POINTS = 4;
export const MAX_POINTS = 100_000;
/** Largest CSV text accepted (characters). */
export const MAX_CSV_LENGTH = 4_000_000;

const LENGTH_UNITS: Record<string, (v: number) => number> = {
  bohr: (v) => v,
  angstrom: angstromToBohr,
  pm: pmToBohr,
};
const ENERGY_UNITS: Record<string, (v: number) => number> = {
  hartree: (v) => v,
  ev: evToHartree,
};

export interface PotentialTable {
  /** Radii in bohr, strictly increasing. */
  r: Float64Array;
  /** V in hartree. */
  V: Float64Array;
  /** Units as written in the header, e.g. { r: "angstrom", V: "eV" }. */
  units: { r: string; V: string };
}

function parseNumber(text: string): number {
  const t = text.trim();
  // Number('') is 0 and Number('0x1') is 1: accept decimal notation only.
  if (!/^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/.test(t)) return Number.NaN;
  return Number(t);
}

export function parsePotentialCsv(csv: unknown, field = 'csv'): PotentialTable {
  if (typeof csv !== 'string') throw new OrbitalInputError(field, 'must be CSV text');
  if (csv.length > MAX_CSV_LENGTH)
    throw new OrbitalInputError(field, `is ${csv.length} characters long; at most ${MAX_CSV_LENGTH} are accepted`);
  const lines = csv.split(/\r\n|\n|\r/);
  let header: { r: string; V: string } | null = null;
  let toBohr = LENGTH_UNITS.bohr;
  let toHartree = ENERGY_UNITS.hartree;
  const rs: number[] = [];
  const vs: number[] = [];
  for (let i = 0; i < lines.length; i++) {
    const line = lines[i].trim();
    const at = `line ${i + 1}`;
    if (line === '' || line.startsWith('#')) continue;
    const cells = line.split(',');
    if (!header) {
      const names = cells.map((c) => c.trim());
      const r = /^r_(\w+)$/i.exec(names[0] ?? '');
      const v = /^V_(\w+)$/i.exec(names[1] ?? '');
      if (names.length !== 2 || !r || !v) {
        throw new OrbitalInputError(field, `${at}: the header must name two columns with units, e.g. "r_bohr,V_hartree" or "r_angstrom,V_eV", got "${line}"`);
      }
      const rUnit = r[1].toLowerCase();
      const vUnit = v[1].toLowerCase();
      if (!(rUnit in LENGTH_UNITS))
        throw new OrbitalInputError(field, `${at}: unknown length unit "${r[1]}"; use bohr, angstrom or pm`);
      if (!(vUnit in ENERGY_UNITS))
        throw new OrbitalInputError(field, `${at}: unknown energy unit "${v[1]}"; use hartree or eV`);
      toBohr = LENGTH_UNITS[rUnit];
      toHartree = ENERGY_UNITS[vUnit];
      header = { r: r[1], V: v[1] };
      continue;
    }
    if (cells.length !== 2) throw new OrbitalInputError(field, `${at}: expected two values "r,V", got ${cells.length}`);
    const r = parseNumber(cells[0]);
    const V = parseNumber(cells[1]);
    if (!Number.isFinite(r)) throw new OrbitalInputError(field, `${at}: r "${cells[0].trim()}" is not a finite number`);
    if (!Number.isFinite(V)) throw new OrbitalInputError(field, `${at}: V "${cells[1].trim()}" is not a finite number`);
    if (r < 0) throw new OrbitalInputError(field, `${at}: r must not be negative, got ${r}`);
    const rBohr = toBohr(r);
    if (rs.length > 0 && !(rBohr > rs[rs.length - 1]))
      throw new OrbitalInputError(field, `${at}: r must increase strictly from row to row (${r} follows a radius at least as large)`);
    if (rs.length >= MAX_POINTS) throw new OrbitalInputError(field, `${at}: more than ${MAX_POINTS} rows`);
    rs.push(rBohr);
    vs.push(toHartree(V));
  }
  if (!header) throw new OrbitalInputError(field, 'is empty: expected a header such as "r_bohr,V_hartree" and rows');
  if (rs.length < MIN_POINTS)
    throw new OrbitalInputError(field, `has ${rs.length} data rows; at least ${MIN_POINTS} are needed for a spline`);
  return { r: Float64Array.from(rs), V: Float64Array.from(vs), units: header };
}
