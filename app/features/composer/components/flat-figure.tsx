// A 2D figure's SVG in the page: scaled to the box, or at its printed size in mm.
import { useId } from 'react';
import { scopeSvgIds } from '../utils/scope-svg-ids';

export function FlatFigure({
  svg,
  printSize,
}: {
  svg: string;
  printSize?: { widthMm: number; heightMm: number };
}) {
  const prefix = `f${useId().replace(/[^a-zA-Z0-9]/g, '')}-`;
  return (
    <div
      className={
        printSize
          ? '[&>svg]:block'
          : 'w-full [&>svg]:block [&>svg]:h-auto [&>svg]:max-h-[640px] [&>svg]:w-full'
      }
      style={
        printSize
          ? { width: `${printSize.widthMm}mm`, height: `${printSize.heightMm}mm` }
          : undefined
      }
      // The SVG comes from our own scene writer, which escapes every text it prints.
      dangerouslySetInnerHTML={{ __html: scopeSvgIds(svg, prefix) }}
    />
  );
}
