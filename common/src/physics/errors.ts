/**
 * Error types of the physics core. The compute layer maps them to HTTP statuses:
 * InputError → 400, NoSolutionError → 422; ConvergenceError is a bug or an ill-conditioned case,
 * never the user's fault.
 */

/** Malformed or inconsistent input; `fields` maps a dotted path (e.g. `profile.layers[1].name`) to a reason. */
export class InputError extends Error {
  constructor(
    message: string,
    readonly fields: Record<string, string>,
  ) {
    super(message);
    this.name = 'InputError';
  }
}

/** A profile that fails validation (a kind of InputError, so it maps to 400). */
export class ProfileInputError extends InputError {
  constructor(message: string, fields: Record<string, string>) {
    super(message, fields);
    this.name = 'ProfileInputError';
  }
}

/** Well-formed input with no physical answer (e.g. slant path below the plasma frequency). */
export class NoSolutionError extends Error {
  constructor(
    message: string,
    readonly reason: string,
  ) {
    super(message);
    this.name = 'NoSolutionError';
  }
}

/** An iteration failed to converge; carries the last state for diagnosis. */
export class ConvergenceError extends Error {
  constructor(
    message: string,
    readonly lastState: unknown,
  ) {
    super(message);
    this.name = 'ConvergenceError';
  }
}
