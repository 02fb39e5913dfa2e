// Orbital names as plain text for places that cannot typeset subscripts (drop-down options):
// "dz²", "fxyz", "g (m = +2)".
import type { OrbitalLabel } from '../../../../shared/physics/orbital-labels';

export function orbitalPlainText(label: OrbitalLabel): string {
  return label.parts
    .map((p) => ('t' in p ? p.t : p.sub.startsWith('m=') ? ` (m = ${p.sub.slice(2)})` : p.sub))
    .join('');
}
