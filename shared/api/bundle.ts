// The Lobewright bundle: a project's (or one figure's) specs, captions, alt text, house style and
// uploaded data as one JSON document of our own, for moving figures between installations and
// projects. No user data, no timestamps: the same project always exports the same text.
import { z } from 'zod';
import { houseStyleInputSchema } from '../spec/house-style';
import { datasetPointsSchema, radialDataQuantitySchema } from './datasets';

export const LOBEWRIGHT_BUNDLE_FORMAT = 1;
/** Largest bundle file accepted on import. */
export const MAX_BUNDLE_BYTES = 5 * 1024 * 1024;
export const MAX_BUNDLE_FIGURES = 1000;
export const MAX_BUNDLE_DATASETS = 200;

/**
 * A figure as carried in a bundle. The spec is checked separately, after migration from the
 * bundle's schema version, so its errors can name the figure and the field.
 */
export const bundleFigureSchema = z.object({
  number: z.string(),
  title: z.string(),
  caption: z.string().default(''),
  altText: z.string().default(''),
  spec: z.record(z.string(), z.unknown()),
});
export type BundleFigure = z.infer<typeof bundleFigureSchema>;

export const bundleDatasetSchema = z
  .object({
    /** The data set's id in the project it came from; figures refer to it by this id. */
    id: z.number().int().positive(),
    name: z.string().trim().min(1).max(120),
    quantity: radialDataQuantitySchema,
    rUnit: z.string().max(40),
    valueUnit: z.string().max(40),
  })
  .and(datasetPointsSchema);
export type BundleDataset = z.infer<typeof bundleDatasetSchema>;

export const bundleSchema = z.object({
  lobewrightBundle: z.literal(
    LOBEWRIGHT_BUNDLE_FORMAT,
    `this Lobewright reads bundle format ${LOBEWRIGHT_BUNDLE_FORMAT}`,
  ),
  /** Figure spec schema version of the specs inside (a spec may also carry its own). */
  schemaVersion: z.number().int().min(1),
  project: z.object({
    name: z.string().trim().min(1).max(200),
    description: z.string().trim().max(2000).default(''),
    houseStyle: houseStyleInputSchema.default({ look: {}, print: {} }),
  }),
  figures: z.array(bundleFigureSchema).max(MAX_BUNDLE_FIGURES),
  datasets: z.array(bundleDatasetSchema).max(MAX_BUNDLE_DATASETS).optional(),
});
export type LobewrightBundle = z.infer<typeof bundleSchema>;

export const importReportSchema = z.object({
  projectId: z.number(),
  imported: z.array(z.object({ id: z.number(), number: z.string(), title: z.string() })),
  renamed: z.array(z.object({ from: z.string(), to: z.string(), title: z.string() })),
  skipped: z.array(z.object({ number: z.string(), title: z.string(), reason: z.string() })),
  datasets: z.number(),
});
export type ImportReport = z.infer<typeof importReportSchema>;

export const copyFigureBody = z.object({ projectId: z.number().int().positive() });
