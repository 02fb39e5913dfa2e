// An orbital's name set as in print: 3d with z² as a subscript.
import { orbitalLabelParts } from '../utils/orbital-label';

interface OrbitalLabelProps {
  n: number;
  l: number;
  m: number;
  basis?: 'real' | 'complex';
}

export function OrbitalLabel({ n, l, m, basis = 'real' }: OrbitalLabelProps) {
  const { shell, subscript } = orbitalLabelParts(n, l, m, basis);
  return (
    <span className="whitespace-nowrap">
      {shell}
      {subscript && <sub>{subscript}</sub>}
    </span>
  );
}
