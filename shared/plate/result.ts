/**
 * The one result shape of shared/plate: a value, or an error a scientist can read.
 * Errors are for input that cannot be analysed at all (wrong shapes, impossible options); data that is
 * merely poor (too few points, missing reads) gives a value with null numbers and flags instead.
 */

export type PlateErrorCode =
  | 'invalid_input'
  | 'invalid_option'
  | 'invalid_well'
  | 'length_mismatch'
  | 'unsorted_times'
  | 'not_enough_data'
  | 'no_blank'
  | 'degenerate';

export interface PlateError {
  code: PlateErrorCode;
  message: string;
}

export type PlateResult<T> = { ok: true; value: T } | { ok: false; error: PlateError };

export function ok<T>(value: T): PlateResult<T> {
  return { ok: true, value };
}

export function fail<T = never>(code: PlateErrorCode, message: string): PlateResult<T> {
  return { ok: false, error: { code, message } };
}

/** A finite number, or null: results never carry NaN or ±Infinity. */
export function finiteOrNull(v: number | null | undefined): number | null {
  return typeof v === 'number' && Number.isFinite(v) ? v : null;
}
