// Values typed straight into the grid: a pH ("4.5"), or a prefixed value — r2 (replicate),
// v1 (the study's first variant), c50 (standard at 50 µM). Enter applies, Esc drops it.
import type { PhPoint, StudyVariant } from '../api/get-study-context';
import type { WellPatch } from './edit-map';

export const typedStarts = /^[0-9.,rvc]$/;

export type TypedResult = { ok: true; patch: WellPatch; said: string } | { ok: false; message: string };

export function describeTyped(text: string): string {
  const kind = text[0];
  if (kind === 'r') return `replicate ${text.slice(1)}`;
  if (kind === 'v') return `variant number ${text.slice(1)}`;
  if (kind === 'c') return `standard ${text.slice(1)} µM`;
  return `pH ${text}`;
}

export function readTyped(text: string, variants: StudyVariant[], phPoints: PhPoint[]): TypedResult {
  const kind = /^[rvc]/.test(text) ? text[0] : 'p';
  const numberText = (kind === 'p' ? text : text.slice(1)).replace(',', '.');
  const n = Number(numberText);
  if (numberText === '' || !Number.isFinite(n)) return { ok: false, message: `“${text}” is not a number.` };
  switch (kind) {
    case 'r':
      return Number.isInteger(n) && n >= 1 && n <= 99
        ? { ok: true, patch: { replicate: n }, said: `replicate ${n}` }
        : { ok: false, message: 'A replicate is a whole number from 1 to 99.' };
    case 'v': {
      const v = variants[n - 1];
      return v && Number.isInteger(n)
        ? { ok: true, patch: { role: 'sample', variantId: v.id }, said: v.name }
        : {
            ok: false,
            message:
              variants.length === 0
                ? 'The study has no variants yet; add them on the study page.'
                : variants.length === 1
                  ? 'The study has one variant: type v1.'
                  : `The study has variants 1 to ${variants.length}.`,
          };
    }
    case 'c':
      return n >= 0 && n <= 1e7
        ? { ok: true, patch: { role: 'standard', concentrationUm: n }, said: `standard ${n} µM` }
        : { ok: false, message: 'A standard concentration is 0 to 10,000,000 µM.' };
    default: {
      if (n < 0 || n > 14) return { ok: false, message: 'pH must be between 0 and 14.' };
      // A pH of the buffer series brings its buffer along.
      const point = phPoints.find((p) => Math.abs(p.pH - n) < 0.005);
      return { ok: true, patch: point ? { pH: point.pH, buffer: point.buffer } : { pH: n }, said: `pH ${n}` };
    }
  }
}
