// Numbers for tables and details: sensible significant figures, a true minus sign, and a dash
// for missing values. Units are written by the caller beside the number (or in the column title).

const MINUS = '−';

function withMinus(text: string): string {
  return text.startsWith('-') ? MINUS + text.slice(1) : text;
}

/** `digits` significant figures, without exponent notation for lab-sized numbers. */
export function formatSig(value: number | null | undefined, digits = 3, missing = '—'): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return missing;
  if (value === 0) return '0';
  const magnitude = Math.floor(Math.log10(Math.abs(value)));
  if (magnitude >= 6 || magnitude <= -5) return withMinus(value.toExponential(digits - 1));
  const decimals = Math.max(0, digits - 1 - magnitude);
  return withMinus(value.toFixed(Math.min(decimals, 10)));
}

/** A fixed number of decimals (pH to 2, pKa to 3). */
export function formatFixed(value: number | null | undefined, decimals: number, missing = '—'): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return missing;
  const text = value.toFixed(decimals);
  return withMinus(Number(text) === 0 ? (0).toFixed(decimals) : text);
}

/** A signed change, e.g. +0.032 or −0.014. */
export function formatSigned(value: number | null | undefined, decimals: number, missing = '—'): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return missing;
  const text = formatFixed(value, decimals);
  return value > 0 && Number(value.toFixed(decimals)) !== 0 ? `+${text}` : text;
}

/** Thousands grouped (18 300), for coefficients and counts. */
export function formatGrouped(value: number | null | undefined, missing = '—'): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return missing;
  return withMinus(value.toLocaleString('en-GB', { maximumFractionDigits: 6 }).replace(/,/g, ' '));
}

/** A value as it was given (library data keep their published digits), with a true minus sign. */
export function formatPlain(value: number | null | undefined, missing = '—'): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return missing;
  return withMinus(String(value));
}
