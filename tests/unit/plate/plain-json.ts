/**
 * Test helper: a result is plain JSON data when every number in it is finite (JSON.stringify would turn
 * NaN and ±Infinity into null silently, so the check walks the value instead).
 */
export function nonFiniteNumbers(value: unknown, path = '$'): string[] {
  if (typeof value === 'number') return Number.isFinite(value) ? [] : [`${path} = ${value}`];
  if (value === null || typeof value !== 'object') {
    return typeof value === 'function' || typeof value === 'symbol' || typeof value === 'bigint'
      ? [`${path} is ${typeof value}`]
      : [];
  }
  if (ArrayBuffer.isView(value)) return [`${path} is a typed array`];
  const out: string[] = [];
  for (const [k, v] of Object.entries(value)) out.push(...nonFiniteNumbers(v, `${path}.${k}`));
  return out;
}
