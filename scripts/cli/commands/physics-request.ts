// Shared by the physics commands of scripts/lobewright (eval, radial, ylm, props): zod parsing and
// error translation, so every bad request answers with the field at fault and the reason.
import { z } from 'zod';
import { OrbitalInputError } from '../../../shared/physics/orbital-input-error';
import { reducedMassRatio } from '../../../shared/physics/reduced-mass';
import { CliError } from '../cli-error';

/** Most points, radii or directions one request may ask for. */
export const MAX_REQUEST_POINTS = 100_000;

/** "points[2][1]" from the zod path ["points", 2, 1]. */
function fieldName(path: readonly PropertyKey[]): string {
  if (path.length === 0) return 'request';
  return path
    .map((p, i) => (typeof p === 'number' ? `[${p}]` : i === 0 ? String(p) : `.${String(p)}`))
    .join('');
}

export function parseRequest<T extends z.ZodType>(
  schema: T,
  input: unknown,
  command: string,
): z.infer<T> {
  const parsed = schema.safeParse(input);
  if (parsed.success) return parsed.data;
  const issue = parsed.error.issues[0];
  if (issue.code === 'unrecognized_keys') {
    throw new CliError(
      fieldName([...issue.path, issue.keys[0]]),
      `is not a field of a ${command} request`,
    );
  }
  throw new CliError(fieldName(issue.path), issue.message);
}

/** Runs the physics, turning OrbitalInputError into CliError with the request's field name. */
export function withPhysicsErrors<T>(
  run: () => T,
  rename: (field: string) => string = (f) => f,
): T {
  try {
    return run();
  } catch (err) {
    if (err instanceof OrbitalInputError) throw new CliError(rename(err.field), err.reason);
    throw err;
  }
}

/** μ/m_e for "reducedMass": true | false (default false), reported under the request field "reducedMass". */
export function massRatioFor(Z: number, reducedMass: boolean): number {
  if (reducedMass && Z !== 1 && Z !== 2 && Number.isInteger(Z) && Z >= 1 && Z <= 92) {
    throw new CliError(
      'reducedMass',
      `the reduced mass is built in for Z = 1 (¹H) and Z = 2 (⁴He) only, not Z = ${Z}`,
    );
  }
  return withPhysicsErrors(() => reducedMassRatio(Z, reducedMass));
}

export const finite = z.number().refine(Number.isFinite, 'must be a finite number');
export const reducedMassField = z.boolean().default(false);
