/**
 * Programmer errors: a broken invariant inside the engine, never bad user input
 * (that is an `InputError`). The message says which invariant broke.
 */
export function assert(condition: unknown, message: string): asserts condition {
  if (!condition) throw new Error(`Assertion failed: ${message}`);
}

/** Exhaustive-switch helper: the compiler proves this line is unreachable. */
export function assertNever(value: never, what = 'value'): never {
  throw new Error(`Unexpected ${what}: ${JSON.stringify(value)}`);
}
