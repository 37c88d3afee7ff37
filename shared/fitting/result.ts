// The one error shape of the fitting engine: bad input never throws, it returns a typed error.

export type FitErrorCode =
  | 'empty'
  | 'length_mismatch'
  | 'not_finite'
  | 'negative_weight'
  | 'too_few_points'
  | 'single_ph'
  | 'ph_out_of_range'
  | 'unknown_model'
  | 'bad_option'
  | 'bad_start'
  | 'no_parameters'
  | 'model_error'
  | 'internal_error';

export interface FitError {
  code: FitErrorCode;
  message: string;
}

export type Result<T> = { ok: true; value: T } | { ok: false; error: FitError };

export function ok<T>(value: T): Result<T> {
  return { ok: true, value };
}

export function fail<T>(code: FitErrorCode, message: string): Result<T> {
  return { ok: false, error: { code, message } };
}

/** JSON has no NaN or Infinity: every number leaving the engine goes through this. */
export function finiteOrNull(x: number | null | undefined): number | null {
  // −0 becomes 0: JSON cannot tell them apart anyway
  return x === null || x === undefined || !Number.isFinite(x) ? null : x === 0 ? 0 : x;
}

/** x·k, or null when x is null or the product is not finite. */
export function timesOrNull(x: number | null, k: number): number | null {
  return x === null ? null : finiteOrNull(x * k);
}

/** Last-resort guard for the public entry points: an unexpected exception becomes a typed error. */
export function guarded<T>(run: () => Result<T>): Result<T> {
  try {
    return run();
  } catch (error) {
    const detail = error instanceof Error ? error.message : String(error);
    return fail(
      'internal_error',
      `The computation failed unexpectedly (${detail}). Please report this with the data.`,
    );
  }
}
