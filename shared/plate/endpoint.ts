/**
 * End-point reads: one value per well. A value is kept as read; missing values and values above the
 * reader's linear range give null with a flag (default limit 2.5 absorbance units, common practice;
 * null for no limit).
 */
import type { PlateFlag } from './flags';
import { isFiniteNumber } from './input';
import { fail, ok, type PlateResult } from './result';
import { DEFAULT_LINEAR_RANGE_MAX } from './rate-options';

export interface EndpointValue {
  value: number | null;
  flags: PlateFlag[];
}

/** End-point values of a block of wells, e.g. { A1: 0.123, A2: null }. */
export function endpointValues(
  wells: Readonly<Record<string, unknown>>,
  options: { linearRangeMax?: number | null } = {},
): PlateResult<Record<string, EndpointValue>> {
  if (typeof wells !== 'object' || wells === null || Array.isArray(wells)) {
    return fail('invalid_input', 'End-point values must be given per well, e.g. { "A1": 0.12 }.');
  }
  const limit = options.linearRangeMax === undefined ? DEFAULT_LINEAR_RANGE_MAX : options.linearRangeMax;
  if (limit !== null && !isFiniteNumber(limit)) {
    return fail('invalid_option', `The linear-range limit must be a number or null (got ${String(limit)}).`);
  }
  const out: Record<string, EndpointValue> = {};
  for (const [well, raw] of Object.entries(wells)) {
    if (!isFiniteNumber(raw)) out[well] = { value: null, flags: ['missing_values'] };
    else if (limit !== null && raw > limit) out[well] = { value: null, flags: ['above_linear_range'] };
    else out[well] = { value: raw, flags: [] };
  }
  return ok(out);
}
