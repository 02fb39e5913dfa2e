/**
 * The one error type of the orbital computation: bad quantum numbers, nuclear charge, weights or
 * options. Every public function of shared/physics throws it for bad input (it never returns NaN
 * for a bad argument); `field` names the offending input, e.g. "terms[0].l" or "Z".
 */
export class OrbitalInputError extends Error {
  override readonly name = 'OrbitalInputError';
  /** The reason alone, without the field name in front (the message has both). */
  readonly reason: string;
  constructor(
    readonly field: string,
    reason: string,
  ) {
    super(`${field}: ${reason}`);
    this.reason = reason;
  }
}
