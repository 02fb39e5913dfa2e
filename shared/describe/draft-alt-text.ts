// Drafts alt text for a figure from its spec and from computed facts (node counts and positions,
// nodal surfaces, energies, wavelengths), in plain words an author can edit. Nothing here is canned
// per orbital: every clause is derived from the numbers shared/physics computes for this spec.
import { angularNodes } from '../physics/angular-nodes';
import { orbitalLabel } from '../physics/orbital-labels';
import { radialNodes } from '../physics/radial-nodes';
import { spectralLine } from '../physics/spectral-lines';
import { mostProbableRadius } from '../physics/most-probable-radius';
import { describeSystem, systemMassRatio } from '../figures/figure-system';
import { lengthUnit } from '../figures/length-units';
import { buildPotential } from '../solver/potentials/build-potential';
import type { SpecTerm } from '../spec/figure-spec';
import type { ResolvedFigureSpec } from '../spec/resolve-figure-spec';

const COUNT_WORDS = ['no', 'one', 'two', 'three', 'four', 'five', 'six', 'seven', 'eight', 'nine', 'ten'];
const count = (n: number, one: string, many = `${one}s`) => `${COUNT_WORDS[n] ?? String(n)} ${n === 1 ? one : many}`;
const percent = (p: number) => `${+(p * 100).toFixed(1)} %`;

function termName(t: Pick<SpecTerm, 'n' | 'l' | 'm' | 'basis'>): string {
  return orbitalLabel(t.n, t.l, t.m, t.basis).text;
}

function formatLength(bohr: number, spec: ResolvedFigureSpec): string {
  const unit = lengthUnit(spec.system.lengthUnit);
  const v = bohr * unit.perBohr;
  return `${v >= 100 ? v.toFixed(0) : v >= 10 ? v.toFixed(1) : v.toFixed(2)} ${unit.symbol}`;
}

function planeName(normal: readonly number[]): string {
  const [x, y, z] = normal.map((c) => Math.abs(c) > 1e-9);
  if (z && !x && !y) return 'the xy-plane';
  if (y && !x && !z) return 'the xz-plane';
  if (x && !y && !z) return 'the yz-plane';
  return 'a vertical plane through the z axis';
}

/** Nodal surfaces and lobes of one real or complex orbital, from the computed node data. */
function describeOrbital(t: SpecTerm, spec: ResolvedFigureSpec): string[] {
  const sentences: string[] = [];
  const mu = systemMassRatio(spec);
  const radial = radialNodes(t.n, t.l, spec.system.Z, mu);
  const angular = angularNodes(t.l, t.m, t.basis);
  const parts: string[] = [];
  if (angular.planes.length) {
    const names = [...new Set(angular.planes.map((p) => planeName(p.normal)))];
    parts.push(`${count(angular.planes.length, 'nodal plane')} (${names.join(', ')})`);
  }
  const cones = angular.cones.filter((c) => Math.abs(c.cosTheta) > 1e-12);
  const flat = angular.cones.length - cones.length;
  if (flat) parts.push(`a nodal plane in the xy-plane`);
  if (cones.length) {
    const angles = cones
      .map((c) => (c.halfAngle * 180) / Math.PI)
      .sort((a, b) => a - b)
      .map((deg) => `${deg.toFixed(1)}°`);
    parts.push(`${count(cones.length, 'nodal cone')} about the z axis at ${angles.join(' and ')} from +z`);
  }
  if (radial.length) {
    parts.push(`${count(radial.length, 'spherical radial node')} at r = ${radial.map((r) => formatLength(r, spec)).join(', ')}`);
  }
  sentences.push(parts.length ? `It has ${parts.join('; ')}.` : 'It has no nodal surfaces: one lobe of a single phase.');
  if (t.basis === 'real') {
    // |m| planes through z cut 2|m| sectors; the l − |m| polar surfaces cut l − |m| + 1 bands.
    const sectors = t.m === 0 ? 1 : 2 * Math.abs(t.m);
    const bands = angular.count - Math.abs(t.m) + 1;
    const regions = sectors * bands * (radial.length + 1);
    if (regions > 1) sentences.push(`Neighbouring regions separated by these surfaces have opposite phase: ${count(regions, 'region')} in all.`);
  } else if (t.m !== 0) {
    sentences.push('The complex orbital has a phase that winds once per ' + (Math.abs(t.m) === 1 ? 'turn' : `1/${Math.abs(t.m)} turn`) + ' about the z axis; colour shows the phase.');
  }
  return sentences;
}

function stateName(spec: ResolvedFigureSpec): string {
  const terms = spec.state.terms;
  if (terms.length === 1) return `${termName(terms[0])} orbital`;
  return `superposition of ${terms.map(termName).join(', ')}`;
}

function viewSentence(spec: ResolvedFigureSpec): string {
  const { azimuthDeg, elevationDeg, projection } = spec.view;
  return `Seen from azimuth ${azimuthDeg}° and elevation ${elevationDeg}° (${projection} view).`;
}

export function draftAltText(spec: ResolvedFigureSpec): string {
  const system = describeSystem(spec);
  const k = spec.kind;
  const single = spec.state.terms.length === 1 ? spec.state.terms[0] : null;
  const colours = 'Positive and negative phases are drawn in two colours.';
  switch (k.type) {
    case 'isosurface': {
      const out = [`Isosurface enclosing ${percent(k.enclosed)} of the probability of a ${stateName(spec)} (${system}).`];
      if (single) out.push(...describeOrbital(single, spec));
      if (k.outerSurface) out.push(`A translucent outer surface encloses ${percent(k.outerSurface.enclosed)}.`);
      out.push(colours, viewSentence(spec));
      return out.join(' ');
    }
    case 'cloud': {
      const out = [`Probability cloud of ${k.points.toLocaleString('en-GB')} points sampled from the probability density of a ${stateName(spec)} (${system}).`];
      if (single) out.push(...describeOrbital(single, spec));
      out.push(viewSentence(spec));
      return out.join(' ');
    }
    case 'slice': {
      const plane = typeof k.plane === 'string' ? `the ${k.plane}-plane` : `the plane through the nucleus with normal (${k.plane.normal.join(', ')})`;
      const what = k.quantity === 'psi' ? 'the signed wavefunction' : 'the probability density';
      const contours =
        k.contours.mode === 'enclosed'
          ? k.contours.fractions.length
            ? ` Contour lines mark the surfaces enclosing ${k.contours.fractions.map(percent).join(' and ')} of the probability.`
            : ''
          : k.contours.levels.length
            ? ` Contour lines at ${k.contours.levels.length} chosen levels.`
            : '';
      const out = [`Slice of ${what} of a ${stateName(spec)} (${system}) in ${plane}.${contours}`];
      if (single) out.push(...describeOrbital(single, spec));
      if (k.quantity === 'psi') out.push(colours);
      return out.join(' ');
    }
    case 'radial': {
      const names: Record<string, string> = { R: 'radial function R', r2R2: 'radial distribution r²R²', cumulative: 'cumulative radial probability', veff: 'effective potential' };
      const mu = systemMassRatio(spec);
      const curves = k.curves.map((c) => `${names[c.quantity]} of ${orbitalLabel(c.n, c.l, 0, 'complex').text.replace(/_.*$/, '')}`);
      const out = [`Radial plot (${system}) of the ${curves.join('; ')}, against r in ${lengthUnit(spec.system.lengthUnit).symbol}.`];
      for (const c of k.curves.filter((c) => c.quantity !== 'veff' && c.quantity !== 'cumulative')) {
        const name = orbitalLabel(c.n, c.l, 0, 'complex').text.replace(/_.*$/, '');
        const nodes = radialNodes(c.n, c.l, spec.system.Z, mu);
        const rmp = mostProbableRadius(c.n, c.l, spec.system.Z, mu);
        out.push(
          `${name}: ${nodes.length ? `nodes at ${nodes.map((r) => formatLength(r, spec)).join(', ')}` : 'no radial nodes'}; most probable radius ${formatLength(rmp, spec)}.`,
        );
      }
      return out.join(' ');
    }
    case 'levels': {
      const mu = systemMassRatio(spec);
      const out = [`Energy-level diagram (${system}) for n = 1 to ${k.nMax}.`];
      if (k.transitions.length) {
        const lines = k.transitions.map((t) => {
          const line = spectralLine(t.upper, t.lower, spec.system.Z, mu);
          return `${t.upper} → ${t.lower}${line.series ? ` (${line.series})` : ''} at ${line.vacuumNm.toFixed(1)} nm in vacuum`;
        });
        out.push(`Arrows mark the transitions ${lines.join('; ')}.`);
      }
      return out.join(' ');
    }
    case 'angular': {
      const t = single ?? spec.state.terms[0];
      const what = k.quantity === 'abs' ? `|Y| of the ${termName(t)} angular part` : `the real angular function of ${termName(t)}`;
      const form = k.mode === 'surface' ? 'polar surface' : `polar curve in the ${typeof k.plane === 'string' ? `${k.plane}-plane` : 'chosen plane'}`;
      const nodes = angularNodes(t.l, t.m, t.basis);
      return `A ${form} of ${what}: the distance from the centre is the function's size in each direction. ${count(nodes.count, 'angular nodal surface')}. ${k.quantity === 'real' ? colours : ''}`.trim();
    }
    case 'potential':
      return `Effective-potential figure for the ${buildPotential(k.potential, 'kind.potential').label} potential: V(r), the centrifugal term and V_eff for l = ${k.l.join(', ')}, with the lowest ${k.levels} solved level${k.levels === 1 ? '' : 's'} of each l drawn between their classical turning points.`;
  }
}
