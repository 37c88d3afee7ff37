/**
 * Guards for values that arrive from parsed files and JSON: anything may be missing or malformed.
 */

/** true for a finite number (not NaN, not ±Infinity). */
export function isFiniteNumber(v: unknown): v is number {
  return typeof v === 'number' && Number.isFinite(v);
}

/** true for an array (of anything). */
export function isArray(v: unknown): v is readonly unknown[] {
  return Array.isArray(v);
}

/** Finite numbers of a list, skipping null, NaN, ±Infinity and non-numbers; also reports how many were skipped. */
export function finiteValues(values: readonly unknown[]): { values: number[]; skipped: number } {
  const out: number[] = [];
  for (const v of values) if (isFiniteNumber(v)) out.push(v);
  return { values: out, skipped: values.length - out.length };
}

/** Checks an optional positive finite option; returns a message when it is wrong. */
export function checkPositive(name: string, v: unknown): string | null {
  if (v === undefined) return null;
  return isFiniteNumber(v) && v > 0 ? null : `${name} must be a positive number (got ${String(v)}).`;
}
