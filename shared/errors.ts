/**
 * Errors that cross the engine's edge. An `InputError` means the caller gave a value the
 * engine cannot use; it names the field (a parameter key or a dotted path) and the limit,
 * so a form, the API and the command line can all show the same message.
 */
export class InputError extends Error {
  override readonly name = 'InputError';
  /** The parameter key or dotted path that was wrong, e.g. `width` or `lid.overhangFront`. */
  readonly field: string;
  /** The limit that was broken, in words a maker reads, e.g. `between 12 in and 96 in`. */
  readonly limit: string | undefined;

  constructor(field: string, message: string, limit?: string) {
    super(message);
    this.field = field;
    this.limit = limit;
  }
}

/** True when `error` is an {@link InputError}; works across bundles where `instanceof` may not. */
export function isInputError(error: unknown): error is InputError {
  return error instanceof Error && error.name === 'InputError' && 'field' in error;
}
