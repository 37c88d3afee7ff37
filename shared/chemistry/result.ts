// Typed results for the chemistry core: every public function returns one of these and never
// throws out. Callers branch on `ok`; the message is written for a scientist, not a programmer.

export type ChemErrorCode =
  | 'invalid-input'
  | 'negative-concentration'
  | 'ph-out-of-range'
  | 'temperature-out-of-range'
  | 'unknown-buffer'
  | 'unknown-form'
  | 'ph-far-from-pka'
  | 'impossible-recipe'
  | 'no-convergence'
  | 'internal-error';

export interface ChemError {
  code: ChemErrorCode;
  message: string;
}

export type ChemResult<T> = { ok: true; value: T } | { ok: false; error: ChemError };

export function ok<T>(value: T): ChemResult<T> {
  return { ok: true, value };
}

export function fail<T = never>(code: ChemErrorCode, message: string): ChemResult<T> {
  return { ok: false, error: { code, message } };
}

/** Thrown only inside the core; `guard` turns it into a typed failure at the public boundary. */
export class ChemFailure extends Error {
  constructor(
    readonly code: ChemErrorCode,
    message: string,
  ) {
    super(message);
    this.name = 'ChemFailure';
  }
}

/** Runs a computation and converts any escape (typed or not) into `{ ok: false }`. */
export function guard<T>(compute: () => T): ChemResult<T> {
  try {
    return ok(compute());
  } catch (error) {
    if (error instanceof ChemFailure) return fail(error.code, error.message);
    const message = error instanceof Error ? error.message : 'unknown error';
    return fail('internal-error', `The calculation failed unexpectedly: ${message}`);
  }
}

/** `guard` for a public entry point whose argument must be an object of named inputs. */
export function guardInput<T>(input: unknown, compute: () => T): ChemResult<T> {
  if (typeof input !== 'object' || input === null || Array.isArray(input)) {
    return fail('invalid-input', 'Expected an object of named inputs.');
  }
  return guard(compute);
}
