// An orbital's conventional name typeset with its subscript (3d<sub>z²</sub>).
import type { OrbitalLabel } from '../../../../shared/physics/orbital-labels';

export function OrbitalName({ label }: { label: OrbitalLabel }) {
  return (
    <>
      {label.parts.map((p, i) =>
        't' in p ? <span key={i}>{p.t}</span> : <sub key={i}>{p.sub}</sub>,
      )}
    </>
  );
}
