// The one application error type: a code for programs, a message for people, an HTTP status,
// optional per-field reasons, and the cause kept for the log (never sent to clients).
export class AppError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields?: Record<string, string>,
    options?: { cause?: unknown; details?: Record<string, unknown> },
  ) {
    super(message, options);
    this.details = options?.details;
  }
  /** Machine-readable extras for the client, e.g. the current revision on a stale save. */
  readonly details?: Record<string, unknown>;
}

export const notFound = (what: string) => new AppError(404, 'not_found', `${what} not found`);
export const forbidden = (message: string) => new AppError(403, 'forbidden', message);
export const unauthenticated = () => new AppError(401, 'unauthenticated', 'sign in first');
export const conflict = (code: string, message: string, details?: Record<string, unknown>) =>
  new AppError(409, code, message, undefined, { details });
