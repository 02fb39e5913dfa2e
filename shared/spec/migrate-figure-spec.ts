// Reads a figure spec of any known schema version and returns it at the current version.
// Version 1 is the first; each later version adds one step here (never edits an old one).
import { FIGURE_SPEC_VERSION, figureSpecSchema, type FigureSpec } from './figure-spec';

type Migration = (old: Record<string, unknown>) => Record<string, unknown>;
/** migrations[v] turns a version-v document into version v+1. */
const migrations: Record<number, Migration> = {};

export class SpecVersionError extends Error {
  readonly field = 'schemaVersion';
}

export function migrateFigureSpec(raw: unknown): FigureSpec {
  if (typeof raw !== 'object' || raw === null) throw new SpecVersionError('a figure spec must be a JSON object');
  let doc = raw as Record<string, unknown>;
  let version = doc.schemaVersion;
  if (typeof version !== 'number' || !Number.isInteger(version) || version < 1)
    throw new SpecVersionError('schemaVersion must be a whole number from 1');
  if (version > FIGURE_SPEC_VERSION)
    throw new SpecVersionError(
      `schemaVersion ${version} is newer than this Lobewright understands (${FIGURE_SPEC_VERSION})`,
    );
  while (version < FIGURE_SPEC_VERSION) {
    doc = { ...migrations[version](doc), schemaVersion: version + 1 };
    version += 1;
  }
  return figureSpecSchema.parse(doc);
}
