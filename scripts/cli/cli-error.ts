// The one error type of the command-line tool: names the request field at fault.
export class CliError extends Error {
  constructor(
    readonly field: string,
    message: string,
    readonly code = 'invalid_field',
  ) {
    super(message);
  }
}

/** A CLI command takes the parsed JSON request and returns the JSON answer (or throws CliError). */
export type CliCommand = (request: unknown) => unknown | Promise<unknown>;
