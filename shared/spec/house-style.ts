// A project's house style: the look and print settings every figure inherits unless it overrides them.
import { z } from 'zod';
import { lookSchema, printSchema } from './figure-spec';

export const houseStyleSchema = z.object({
  look: lookSchema.required(),
  print: printSchema.required(),
});
export type HouseStyle = z.infer<typeof houseStyleSchema>;

/** Single column ≈ 84 mm, double column ≈ 174 mm (common practice in journal and textbook production). */
export const COLUMN_WIDTHS_MM = { single: 84, double: 174, slide: 254 } as const;

export const defaultHouseStyle: HouseStyle = {
  look: {
    positiveColour: '#c2410c',
    negativeColour: '#0f766e',
    opacity: 1,
    showAxes: true,
    showScaleBar: true,
    showNodalSurfaces: false,
    showLabel: true,
    label: '',
    fontFamily: 'Lobewright Sans',
    fontSizePt: 8,
    lineWidthPt: 0.5,
  },
  print: {
    widthMm: COLUMN_WIDTHS_MM.single,
    heightMm: COLUMN_WIDTHS_MM.single,
    dpi: 300,
    background: 'transparent',
    formats: ['png', 'pdf'],
  },
};

/** What a project stores: any subset of the look and print settings. */
export const houseStyleInputSchema = z.object({ look: lookSchema.default({}), print: printSchema.default({}) });

/** Fills what a house style leaves unset from the product defaults. */
export function parseHouseStyle(raw: unknown): HouseStyle {
  const partial = houseStyleInputSchema.parse(raw ?? {});
  return {
    look: { ...defaultHouseStyle.look, ...stripUndefined(partial.look) },
    print: { ...defaultHouseStyle.print, ...stripUndefined(partial.print) },
  };
}

export function stripUndefined<T extends object>(o: T): Partial<T> {
  return Object.fromEntries(Object.entries(o).filter(([, v]) => v !== undefined)) as Partial<T>;
}
