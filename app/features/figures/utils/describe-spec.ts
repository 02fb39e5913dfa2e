// A figure spec summarised in words, as label/value pairs for the figure page. Stored values
// only; unset look and print settings are said to come from the house style.
import type { FigureSpec, SpecTerm } from '../../../../shared/spec/figure-spec';
import type { HouseStyle } from '../../../../shared/spec/house-style';
import { resolveFigureSpec } from '../../../../shared/spec/resolve-figure-spec';
import { figureKindInfo } from './figure-kinds';
import { angularMomentumLetter, orbitalLabel } from '../../../../shared/physics/orbital-labels';
import { signedNumber } from './signed-number';

export interface SpecLine {
  term: string;
  detail: string;
}

const percent = (fraction: number) => `${+(fraction * 100).toFixed(1)} %`;
const list = (items: string[]) =>
  items.length <= 1
    ? (items[0] ?? '')
    : `${items.slice(0, -1).join(', ')} and ${items[items.length - 1]}`;

const UNIT_NAMES = { bohr: 'bohr', pm: 'pm', angstrom: 'Å' } as const;
const PLANES = { xy: 'xy plane', xz: 'xz plane', yz: 'yz plane' } as const;
const RADIAL_QUANTITIES = {
  R: 'R(r)',
  r2R2: 'r²R²',
  cumulative: 'cumulative probability',
  veff: 'V_eff',
} as const;

function termLabel(t: SpecTerm): string {
  return orbitalLabel(t.n, t.l, t.m, t.basis).text;
}

function describeState(spec: FigureSpec): string {
  const { terms, time } = spec.state;
  const at = time > 0 ? ` at t = ${time} ħ/E_h` : '';
  if (terms.length === 1) {
    const [t] = terms;
    return `${termLabel(t)} (n = ${t.n}, l = ${t.l}, m = ${signedNumber(t.m)}), ${t.basis} form${at}`;
  }
  return `Superposition of ${terms.length} states: ${list(terms.map(termLabel))}${at}`;
}

function describeSystem(spec: FigureSpec): string {
  const { Z, nucleus, lengthUnit } = spec.system;
  const atom = Z === 1 ? 'Hydrogen (Z = 1)' : `Hydrogen-like ion, Z = ${Z}`;
  const mass =
    nucleus === 'infinite'
      ? 'nucleus of infinite mass'
      : typeof nucleus === 'string'
        ? `reduced mass for ${nucleus}`
        : `nucleus of ${nucleus.massInElectronMasses} electron masses`;
  return `${atom}, ${mass}; lengths in ${UNIT_NAMES[lengthUnit]}`;
}

type Plane = Extract<FigureSpec['kind'], { type: 'slice' }>['plane'];

function planeName(plane: Plane): string {
  return typeof plane === 'string'
    ? PLANES[plane]
    : `plane with normal (${plane.normal.join(', ')})`;
}

function describeKind(spec: FigureSpec): string {
  const k = spec.kind;
  switch (k.type) {
    case 'isosurface': {
      const outer = k.outerSurface
        ? `; outer surface at ${percent(k.outerSurface.enclosed)}, opacity ${k.outerSurface.opacity}`
        : '';
      return `Surface enclosing ${percent(k.enclosed)} of the probability, grid of ${k.grid} points a side${outer}`;
    }
    case 'slice': {
      const what = k.quantity === 'psi' ? 'Signed wavefunction ψ' : 'Probability density |ψ|²';
      const contours =
        k.contours.mode === 'enclosed'
          ? k.contours.fractions.length
            ? `contours enclosing ${list(k.contours.fractions.map(percent))}`
            : 'no contours'
          : `${k.contours.levels.length} contour levels`;
      return `${what} in the ${planeName(k.plane)}, ${contours}, ${k.resolution} × ${k.resolution} samples`;
    }
    case 'radial':
      return list(
        k.curves.map(
          (c) => `${RADIAL_QUANTITIES[c.quantity]} of ${c.n}${angularMomentumLetter(c.l)}`,
        ),
      );
    case 'cloud':
      return `${k.points.toLocaleString('en-GB')} points, random seed ${k.seed}`;
    case 'angular':
      return `${k.mode === 'surface' ? 'Surface' : `Polar curve in the ${planeName(k.plane)}`} of ${k.quantity === 'abs' ? '|Y|' : 'the real angular part'}`;
    case 'levels':
      return `Levels up to n = ${k.nMax}${k.transitions.length ? `, transitions ${list(k.transitions.map((t) => `${t.upper} → ${t.lower}`))}` : ''}`;
    case 'potential':
      return `V(r), centrifugal term and V_eff of the ${k.potential.type} potential for l = ${list(k.l.map(String))}, ${k.levels} solved level${k.levels === 1 ? '' : 's'} each`;
  }
}

const PRINT_FIELD_NAMES = {
  widthMm: 'width',
  heightMm: 'height',
  dpi: 'resolution',
  background: 'background',
  formats: 'formats',
} as const;

function describePrint(spec: FigureSpec, style: HouseStyle | undefined): string {
  const own = (Object.keys(PRINT_FIELD_NAMES) as Array<keyof typeof PRINT_FIELD_NAMES>).filter(
    (k) => spec.print[k] !== undefined,
  );
  if (!style) {
    return own.length
      ? `The figure sets its ${list(own.map((k) => PRINT_FIELD_NAMES[k]))}; the rest from the house style`
      : 'All from the house style';
  }
  const p = resolveFigureSpec(spec, style).print;
  const settings = `${p.widthMm} × ${p.heightMm} mm, ${p.dpi} dpi, ${p.background} background, ${p.formats.map((f) => f.toUpperCase()).join(' + ')}`;
  const source = own.length
    ? `the figure sets its ${list(own.map((k) => PRINT_FIELD_NAMES[k]))}, the rest from the house style`
    : 'all from the house style';
  return `${settings} (${source})`;
}

/** With the project's house style, print settings are given as they will be used. */
export function describeSpec(spec: FigureSpec, style?: HouseStyle): SpecLine[] {
  const lines: SpecLine[] = [
    { term: 'Kind', detail: figureKindInfo[spec.kind.type].name },
    { term: 'State', detail: describeState(spec) },
    { term: 'Atom', detail: describeSystem(spec) },
    { term: 'Drawing', detail: describeKind(spec) },
  ];
  if (
    spec.kind.type === 'isosurface' ||
    spec.kind.type === 'cloud' ||
    (spec.kind.type === 'angular' && spec.kind.mode === 'surface')
  ) {
    const v = spec.view;
    lines.push({
      term: 'View',
      detail: `Azimuth ${v.azimuthDeg}°, elevation ${v.elevationDeg}°, ${v.projection}, zoom ${v.zoom}`,
    });
  }
  lines.push({ term: 'Print', detail: describePrint(spec, style) });
  if (spec.look.label) lines.push({ term: 'Label', detail: spec.look.label });
  return lines;
}
