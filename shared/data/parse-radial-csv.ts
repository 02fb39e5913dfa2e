/**
 * Parser of uploaded radial data in CSV (pure TypeScript, no DOM or Node imports): used by the
 * server on upload and by the client to show problems before sending.
 *
 * Format (documented in README.md, "Radial data uploads"):
 * - Lines that are blank or start with # are skipped. Cells are separated by commas.
 * - The first other line is the header: two columns, r and the quantity, each optionally with its
 *   unit as `name_unit`, `name / unit`, `name (unit)` or `name [unit]`. Quantities: `R` (radial
 *   function, length^-3/2), `r2R2` (also `r^2R^2`, `r²R²`; radial distribution, length^-1), `V`
 *   (potential, hartree or eV). Lengths: bohr (a0), pm, angstrom (Å). Examples:
 *   `r_bohr,R_bohr^-3/2`, `r / pm, V / eV`, `r,r2R2` (units then chosen on upload).
 * - Then one row per point: two decimal numbers. r ≥ 0 and strictly increasing; r²R² ≥ 0;
 *   MIN_ROWS to MAX_ROWS rows.
 * Every problem names its 1-based line; up to MAX_PROBLEMS are reported at once. Returned values
 * are in atomic units (see radial-data-units.ts).
 */
import {
  lengthToBohr,
  parseLengthUnit,
  parseValueUnit,
  valueToAtomicUnits,
  valueUnitsFor,
  type RadialDataQuantity,
  type RadialLengthUnit,
} from './radial-data-units';

export const MIN_ROWS = 3;
export const MAX_ROWS = 20_000;
/** Longest CSV text read (characters); 20 000 rows of two 17-digit numbers fit easily. */
export const MAX_CSV_CHARS = 2_000_000;
const MAX_PROBLEMS = 20;

export interface RadialCsvProblem {
  /** 1-based line of the file, or null for the file as a whole. */
  line: number | null;
  /** The upload field at fault: "file", "rUnit" or "valueUnit". */
  field: 'file' | 'rUnit' | 'valueUnit';
  message: string;
}

export class RadialCsvError extends Error {
  constructor(readonly problems: RadialCsvProblem[]) {
    super(
      problems
        .map((p) => (p.line === null ? p.message : `line ${p.line}: ${p.message}`))
        .join('; '),
    );
  }
}

export interface RadialCsvData {
  quantity: RadialDataQuantity;
  /** Units as uploaded (canonical spelling), kept for display. */
  rUnit: RadialLengthUnit;
  valueUnit: string;
  /** Radii in bohr, strictly increasing. */
  r: number[];
  /** Values in atomic units: bohr^-3/2 (R), bohr^-1 (r²R²) or hartree (V). */
  values: number[];
}

export interface RadialCsvOptions {
  /** Length unit of r when the header states none. */
  rUnit?: string;
  /** Unit of the values when the header states none. */
  valueUnit?: string;
}

const QUANTITY_NAMES: Record<string, RadialDataQuantity> = {
  R: 'R',
  r2R2: 'r2R2',
  'r^2R^2': 'r2R2',
  'r\u00b2R\u00b2': 'r2R2',
  V: 'potential',
};
const SYMBOL: Record<RadialDataQuantity, string> = { R: 'R', r2R2: 'r²R²', potential: 'V' };
const HEADER_CELL = /^([A-Za-z][A-Za-z0-9^\u00b2]*)\s*(?:(?:_|\/|\(|\[)(.*))?$/;

/** Decimal notation only: Number('') is 0 and Number('0x1') is 1, neither is data. */
function parseDecimal(text: string): number {
  return /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/.test(text) ? Number(text) : Number.NaN;
}

function headerCell(cell: string): { name: string; unit: string } | null {
  const m = HEADER_CELL.exec(cell.trim());
  return m ? { name: m[1], unit: (m[2] ?? '').replace(/[)\]]\s*$/, '').trim() } : null;
}

interface Header {
  quantity: RadialDataQuantity;
  rUnit: RadialLengthUnit | null;
  valueUnit: string | null;
}

function readHeader(
  line: string,
  at: number,
  options: RadialCsvOptions,
  problems: RadialCsvProblem[],
): Header | null {
  const cells = line.split(',').map(headerCell);
  const [r, v] = cells;
  const quantity = v ? QUANTITY_NAMES[v.name] : undefined;
  if (cells.length !== 2 || !r || r.name !== 'r' || !v || !quantity) {
    problems.push({
      line: at,
      field: 'file',
      message: `the header must name two columns: r, then R, r2R2 or V, each with an optional unit (e.g. "r_bohr,R_bohr^-3/2" or "r / pm, V / eV"); got "${line}"`,
    });
    return null;
  }
  const pick = (
    field: 'rUnit' | 'valueUnit',
    inHeader: string,
    chosen: string | undefined,
    what: string,
  ) => {
    if (inHeader && chosen && inHeader !== chosen) {
      problems.push({
        line: at,
        field,
        message: `the header gives ${what} in ${inHeader} but ${chosen} was chosen; leave the choice empty or make them agree`,
      });
    }
    return inHeader || chosen || '';
  };
  const rText = pick('rUnit', r.unit, options.rUnit, 'r');
  const vText = pick('valueUnit', v.unit, options.valueUnit, SYMBOL[quantity]);
  let rUnit: RadialLengthUnit | null = null;
  let valueUnit: string | null = null;
  if (!rText)
    problems.push({
      line: at,
      field: 'rUnit',
      message:
        'the header gives no unit for r: write it there (e.g. "r / pm") or choose bohr, pm or angstrom',
    });
  else if (!(rUnit = parseLengthUnit(rText) ?? null))
    problems.push({
      line: at,
      field: 'rUnit',
      message: `unknown length unit "${rText}"; use bohr, pm or angstrom`,
    });
  const offered = valueUnitsFor(quantity).join(', ');
  if (!vText)
    problems.push({
      line: at,
      field: 'valueUnit',
      message: `the header gives no unit for ${SYMBOL[quantity]}: write it there or choose one of ${offered}`,
    });
  else if (!(valueUnit = parseValueUnit(quantity, vText) ?? null))
    problems.push({
      line: at,
      field: 'valueUnit',
      message: `"${vText}" is not a unit of ${SYMBOL[quantity]}; use one of ${offered}`,
    });
  return { quantity, rUnit, valueUnit };
}

export function parseRadialCsv(text: string, options: RadialCsvOptions = {}): RadialCsvData {
  if (text.length > MAX_CSV_CHARS)
    throw new RadialCsvError([
      {
        line: null,
        field: 'file',
        message: `the file has ${text.length} characters; at most ${MAX_CSV_CHARS} are read`,
      },
    ]);
  const lines = text.replace(/^\ufeff/, '').split(/\r\n|\n|\r/);
  const problems: RadialCsvProblem[] = [];
  let header: Header | null | undefined;
  const rs: number[] = [];
  const vs: number[] = [];
  let lastR = -Infinity;
  let rows = 0;
  for (let i = 0; i < lines.length && problems.length < MAX_PROBLEMS; i++) {
    const line = lines[i].trim();
    const at = i + 1;
    if (line === '' || line.startsWith('#')) continue;
    if (header === undefined) {
      header = readHeader(line, at, options, problems);
      if (!header) break;
      continue;
    }
    if (!header) break;
    rows += 1;
    if (rows > MAX_ROWS) {
      problems.push({
        line: at,
        field: 'file',
        message: `more than ${MAX_ROWS} data rows; split the data or thin it out`,
      });
      break;
    }
    const cells = line.split(',').map((c) => c.trim());
    if (cells.length !== 2) {
      problems.push({
        line: at,
        field: 'file',
        message: `expected 2 values (r, ${SYMBOL[header.quantity]}) separated by a comma, got ${cells.length}`,
      });
      continue;
    }
    const r = parseDecimal(cells[0]);
    const v = parseDecimal(cells[1]);
    if (!Number.isFinite(r))
      problems.push({
        line: at,
        field: 'file',
        message: `r "${cells[0]}" is not a finite decimal number`,
      });
    else if (r < 0)
      problems.push({
        line: at,
        field: 'file',
        message: `r must not be negative, got ${cells[0]}`,
      });
    else if (!(r > lastR))
      problems.push({
        line: at,
        field: 'file',
        message: `r must increase from row to row, but ${cells[0]} follows ${lastR}`,
      });
    if (!Number.isFinite(v))
      problems.push({
        line: at,
        field: 'file',
        message: `${SYMBOL[header.quantity]} "${cells[1]}" is not a finite decimal number`,
      });
    else if (header.quantity === 'r2R2' && v < 0)
      problems.push({
        line: at,
        field: 'file',
        message: `r²R² is a probability density and cannot be negative, got ${cells[1]}`,
      });
    if (Number.isFinite(r)) lastR = Math.max(lastR, r);
    rs.push(r);
    vs.push(v);
  }
  if (header === undefined)
    problems.push({
      line: null,
      field: 'file',
      message:
        'the file is empty: expected a header such as "r_bohr,R_bohr^-3/2" and rows of numbers',
    });
  else if (header && problems.length === 0 && rows < MIN_ROWS)
    problems.push({
      line: null,
      field: 'file',
      message: `the file has ${rows} data row${rows === 1 ? '' : 's'}; at least ${MIN_ROWS} are needed to draw a curve`,
    });
  if (problems.length > 0 || !header || !header.rUnit || !header.valueUnit)
    throw new RadialCsvError(problems);
  const toBohr = lengthToBohr(header.rUnit);
  const toAu = valueToAtomicUnits(header.quantity, header.valueUnit);
  return {
    quantity: header.quantity,
    rUnit: header.rUnit,
    valueUnit: header.valueUnit,
    r: rs.map((r) => r * toBohr),
    values: vs.map(toAu),
  };
}
