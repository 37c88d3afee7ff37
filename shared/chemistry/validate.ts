// Input guards used at the public boundary. Each throws a ChemFailure that `guard` converts into
// a typed error, so the messages stay in one place.
import { ChemFailure } from './result';

export const PH_MIN = 0;
export const PH_MAX = 14;
export const TEMP_MIN_C = 0;
export const TEMP_MAX_C = 100;

/** A short, never-throwing description of a bad value for a message. */
export function shown(value: unknown): string {
  if (typeof value === 'number' || typeof value === 'boolean') return String(value);
  if (typeof value === 'string') return JSON.stringify(value.slice(0, 40));
  if (value === null || value === undefined) return String(value);
  return Array.isArray(value) ? 'a list' : `a ${typeof value}`;
}

function finite(value: unknown, what: string): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new ChemFailure('invalid-input', `${what} must be a finite number (got ${shown(value)}).`);
  }
  return value;
}

export function checkPH(value: unknown, what = 'pH'): number {
  const pH = finite(value, what);
  if (pH < PH_MIN || pH > PH_MAX) {
    throw new ChemFailure('ph-out-of-range', `${what} ${pH} is outside 0–14.`);
  }
  return pH;
}

export function checkTemperature(value: unknown, what = 'Temperature'): number {
  const t = finite(value, what);
  if (t < TEMP_MIN_C || t > TEMP_MAX_C) {
    throw new ChemFailure(
      'temperature-out-of-range',
      `${what} ${t} °C is outside 0–100 °C, where aqueous buffer data do not apply.`,
    );
  }
  return t;
}

/** A concentration or amount: finite and not negative (zero allowed unless `positive`). */
export function checkAmount(value: unknown, what: string, positive = false): number {
  const x = finite(value, what);
  if (x < 0) throw new ChemFailure('negative-concentration', `${what} cannot be negative (got ${x}).`);
  if (positive && x === 0) throw new ChemFailure('invalid-input', `${what} must be greater than zero.`);
  return x;
}

export function checkRange(value: unknown, what: string, min: number, max: number): number {
  const x = finite(value, what);
  if (x < min || x > max) throw new ChemFailure('invalid-input', `${what} ${x} is outside ${min}–${max}.`);
  return x;
}

/** One of the allowed words, or undefined when not given. */
export function checkChoice<T extends string>(
  value: unknown,
  what: string,
  allowed: readonly T[],
): T | undefined {
  if (value === undefined) return undefined;
  if (typeof value !== 'string' || !allowed.includes(value as T)) {
    throw new ChemFailure(
      'invalid-input',
      `${what} must be one of ${allowed.join(', ')} (got ${shown(value)}).`,
    );
  }
  return value as T;
}
