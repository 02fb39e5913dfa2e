// The house style in words and swatches, for members who may read it but not change it.
import type { HouseStyle } from '../../../../shared/spec/house-style';

function Swatch({ colour, label }: { colour: string; label: string }) {
  return (
    <span className="inline-flex items-center gap-2">
      <span
        aria-hidden="true"
        className="inline-block size-4 rounded-sm ring-1 ring-stone-300"
        style={{ backgroundColor: colour }}
      />
      {label} {colour}
    </span>
  );
}

export function HouseStyleSummary({ style }: { style: HouseStyle }) {
  const { look, print } = style;
  const shown = [
    look.showAxes && 'axes',
    look.showScaleBar && 'scale bar',
    look.showNodalSurfaces && 'nodal surfaces',
    look.showLabel && 'orbital label',
  ].filter(Boolean);
  return (
    <dl className="grid gap-x-6 gap-y-2 text-sm sm:grid-cols-[9rem_1fr]">
      <dt className="font-semibold text-stone-700">Phase colours</dt>
      <dd className="flex flex-wrap gap-4">
        <Swatch colour={look.positiveColour} label="positive" />
        <Swatch colour={look.negativeColour} label="negative" />
      </dd>
      <dt className="font-semibold text-stone-700">Drawing</dt>
      <dd>
        Opacity {look.opacity}; {look.fontFamily} {look.fontSizePt} pt; lines {look.lineWidthPt} pt;
        shows {shown.length ? shown.join(', ') : 'nothing extra'}
      </dd>
      <dt className="font-semibold text-stone-700">Print</dt>
      <dd>
        {print.widthMm} × {print.heightMm} mm at {print.dpi} dpi, {print.background} background,{' '}
        {print.formats.map((f) => f.toUpperCase()).join(' + ')}
      </dd>
    </dl>
  );
}
