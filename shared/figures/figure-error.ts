/**
 * The error a figure builder throws for a spec it cannot draw; `field` is the spec path, e.g.
 * "kind.quantity". Physics errors (OrbitalInputError) pass through with their own field names.
 */
export class FigureSpecError extends Error {
  override readonly name = 'FigureSpecError';
  constructor(
    readonly field: string,
    message: string,
  ) {
    super(`${field}: ${message}`);
  }
}
