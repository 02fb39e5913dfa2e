// Line-numbered problems of a radial CSV: found in the browser before sending (the shared parser)
// or returned by the server (error.details.problems), shown the same way.
import { z } from 'zod';
import { isApiError } from '../../../lib/api-client';
import {
  parseRadialCsv,
  RadialCsvError,
  type RadialCsvData,
  type RadialCsvOptions,
  type RadialCsvProblem,
} from '../../../../shared/data/parse-radial-csv';

const problemSchema = z.object({
  line: z.number().nullable(),
  field: z.enum(['file', 'rUnit', 'valueUnit']),
  message: z.string(),
});

export type CsvCheck =
  { data: RadialCsvData; problems: [] } | { data: null; problems: RadialCsvProblem[] };

export function checkCsv(text: string, options: RadialCsvOptions): CsvCheck {
  try {
    return { data: parseRadialCsv(text, options), problems: [] };
  } catch (err) {
    if (err instanceof RadialCsvError) return { data: null, problems: err.problems };
    throw err;
  }
}

/** The server's problems when it refused the file, else none. */
export function problemsFromError(error: unknown): RadialCsvProblem[] {
  if (!isApiError(error, 'invalid_csv')) return [];
  const parsed = z.array(problemSchema).safeParse(error.details.problems);
  return parsed.success ? parsed.data : [];
}

export function problemText(p: RadialCsvProblem): string {
  return p.line === null ? p.message : `Line ${p.line}: ${p.message}`;
}
