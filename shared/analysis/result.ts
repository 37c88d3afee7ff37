/**
 * The one result shape of shared/analysis: a value, or an error a scientist can read.
 * Errors are kept for input that cannot be analysed at all (no plates, no reads, a read that does not
 * match the assay, impossible settings). Poor data — a missing read, a variant with one point, NaN
 * values — gives a value whose numbers are null and whose flags or messages say why.
 */

export type AnalysisErrorCode =
  | 'invalid_input'
  | 'no_plates'
  | 'no_variants'
  | 'no_reads'
  | 'unknown_reference_variant'
  | 'read_mismatch'
  | 'invalid_setting'
  | 'stale_result'
  | 'internal_error';

export interface AnalysisError {
  code: AnalysisErrorCode;
  message: string;
}

export type Result<T> = { ok: true; value: T } | { ok: false; error: AnalysisError };

export function ok<T>(value: T): Result<T> {
  return { ok: true, value };
}

export function fail<T = never>(code: AnalysisErrorCode, message: string): Result<T> {
  return { ok: false, error: { code, message } };
}

/** A finite number, or null: results never carry NaN or ±Infinity (−0 becomes 0). */
export function num(v: unknown): number | null {
  return typeof v === 'number' && Number.isFinite(v) ? (v === 0 ? 0 : v) : null;
}

/** Last-resort guard for the public entry points: an unexpected exception becomes a typed error. */
export function guarded<T>(run: () => Result<T>): Result<T> {
  try {
    return run();
  } catch (error) {
    const detail = error instanceof Error ? error.message : String(error);
    return fail(
      'internal_error',
      `The analysis failed unexpectedly (${detail}). Please report this with the data.`,
    );
  }
}
