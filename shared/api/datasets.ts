// Request and response shapes of uploaded radial data sets (/api/projects/:id/datasets, /api/datasets/:id).
import { z } from 'zod';
import { MAX_ROWS, MIN_ROWS } from '../data/parse-radial-csv';
import { radialDataQuantities } from '../data/radial-data-units';

/** Largest CSV file accepted on upload. */
export const MAX_DATASET_FILE_BYTES = 2 * 1024 * 1024;

export const radialDataQuantitySchema = z.enum(radialDataQuantities);

export const datasetSummarySchema = z.object({
  id: z.number(),
  projectId: z.number(),
  name: z.string(),
  quantity: radialDataQuantitySchema,
  /** Units as uploaded; the stored values are in atomic units. */
  rUnit: z.string(),
  valueUnit: z.string(),
  points: z.number(),
  /** Range of r in bohr. */
  rMinBohr: z.number(),
  rMaxBohr: z.number(),
  createdBy: z.string(),
  createdAt: z.string(),
});
export type DatasetSummary = z.infer<typeof datasetSummarySchema>;

export const datasetSchema = datasetSummarySchema.extend({
  /** Radii in bohr. */
  r: z.array(z.number()),
  /** Values in atomic units: bohr^-3/2 (R), bohr^-1 (r²R²) or hartree (V). */
  values: z.array(z.number()),
});
export type Dataset = z.infer<typeof datasetSchema>;

/** The form fields beside the uploaded file ("file"). Units only when the CSV header states none. */
export const uploadDatasetFields = z.object({
  name: z.string().trim().min(1, 'give the data set a name').max(120),
  rUnit: z
    .string()
    .trim()
    .max(40)
    .optional()
    .transform((v) => v || undefined),
  valueUnit: z
    .string()
    .trim()
    .max(40)
    .optional()
    .transform((v) => v || undefined),
});

/** Data points in atomic units, as stored and as carried in bundles: r ≥ 0 strictly increasing, same length as values. */
export const datasetPointsSchema = z
  .object({
    r: z.array(z.number().finite().min(0)).min(MIN_ROWS).max(MAX_ROWS),
    values: z.array(z.number().finite()).min(MIN_ROWS).max(MAX_ROWS),
  })
  .refine((d) => d.r.length === d.values.length, {
    path: ['values'],
    message: 'needs as many values as radii',
  })
  .refine((d) => d.r.every((r, i) => i === 0 || r > d.r[i - 1]), {
    path: ['r'],
    message: 'radii must increase strictly',
  });
