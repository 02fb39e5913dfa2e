// An orbital's conventional name set as in print (3d with z² as a subscript), from the labels
// that shared/physics defines.
import { orbitalLabel } from '../../../../shared/physics/orbital-labels';

interface OrbitalLabelProps {
  n: number;
  l: number;
  m: number;
  basis?: 'real' | 'complex';
}

export function OrbitalLabel({ n, l, m, basis = 'real' }: OrbitalLabelProps) {
  const { parts } = orbitalLabel(n, l, m, basis);
  return (
    <span className="whitespace-nowrap">
      {parts.map((part, i) =>
        'sub' in part ? <sub key={i}>{part.sub}</sub> : <span key={i}>{part.t}</span>,
      )}
    </span>
  );
}
