// Combines a stored figure spec with its project's house style into the spec the renderers draw.
import type { FigureSpec } from './figure-spec';
import { stripUndefined, type HouseStyle } from './house-style';

export type ResolvedFigureSpec = Omit<FigureSpec, 'look' | 'print'> & {
  look: HouseStyle['look'];
  print: HouseStyle['print'];
};

export function resolveFigureSpec(spec: FigureSpec, style: HouseStyle): ResolvedFigureSpec {
  return {
    ...spec,
    look: { ...style.look, ...stripUndefined(spec.look) },
    print: { ...style.print, ...stripUndefined(spec.print) },
  };
}
