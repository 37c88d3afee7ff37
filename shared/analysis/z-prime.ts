/**
 * Z′ of a plate (shared/plate zPrimeFactor; Zhang, Chung & Oldenburg 1999, SCIENCE.md §3.3), with the
 * choice of controls a pH-profile plate allows: it has no dedicated controls, so the reference
 * variant at its best pH point stands for "enzyme at work" and the blanks of that point for "no enzyme".
 */
import { zPrimeFactor } from '../plate';
import { phKey } from './blanks';
import type { WellRow, ZPrimeQc } from './types';

export const Z_PRIME_RULE =
  "Positive controls: the reference variant's sample wells at the pH point (and buffer) where its mean " +
  'activity on this plate is highest, among points with at least two blanks on the plate. Negative ' +
  'controls: the blank wells (no enzyme) of that pH point and buffer (of any buffer at that pH when ' +
  'the buffer has fewer than two). Values are the per-well signals (rates for kinetic reads); excluded ' +
  "wells are left out. Without the reference variant on the plate, the plate's most active " +
  'variant × pH point serves.';

const usable = (r: WellRow) => !r.excluded && r.signal !== null && r.pH !== null;
const meanOf = (v: number[]) => v.reduce((s, x) => s + x, 0) / v.length;

export function groupBy(rows: readonly WellRow[], key: (r: WellRow) => string): Map<string, WellRow[]> {
  const out = new Map<string, WellRow[]>();
  for (const r of rows) out.set(key(r), [...(out.get(key(r)) ?? []), r]);
  return out;
}

export const pointKey = (r: WellRow) => `${r.variantId}|${phKey(r.pH!)}|${r.buffer ?? ''}`;

function negativesFor(blanks: WellRow[], pH: number, buffer: string | null): WellRow[] {
  const atPh = blanks.filter((b) => phKey(b.pH!) === phKey(pH));
  const same = atPh.filter((b) => b.buffer === buffer);
  return same.length >= 2 ? same : atPh;
}

export function zPrimeQc(rows: readonly WellRow[], referenceId: string): ZPrimeQc {
  const blanks = rows.filter((r) => r.role === 'blank' && usable(r));
  const samples = rows.filter((r) => r.role === 'sample' && usable(r) && r.variantId);
  const groups = [...groupBy(samples, pointKey).values()]
    .map((members) => {
      const acts = members.map((r) => r.activity).filter((v): v is number => v !== null);
      return {
        members,
        score: acts.length ? meanOf(acts) : null,
        negatives: negativesFor(blanks, members[0].pH!, members[0].buffer),
      };
    })
    .filter((g) => g.score !== null && g.members.length >= 2 && g.negatives.length >= 2);
  const flags: string[] = [];
  let pool = groups.filter((g) => g.members[0].variantId === referenceId);
  if (pool.length === 0 && groups.length > 0) {
    flags.push('reference_not_on_plate');
    pool = groups;
  }
  const empty: ZPrimeQc = {
    zPrime: null,
    band: null,
    robustZPrime: null,
    robustBand: null,
    positive: null,
    negative: null,
    rule: Z_PRIME_RULE,
    flags,
  };
  if (pool.length === 0) return { ...empty, flags: [...flags, 'no_controls'] };
  const best = pool.reduce((a, b) => (b.score! > a.score! ? b : a));
  const pos = best.members.map((r) => r.signal!);
  const neg = best.negatives.map((r) => r.signal!);
  const z = zPrimeFactor(pos, neg);
  const first = best.members[0];
  const negBuffer = best.negatives.every((b) => b.buffer === first.buffer) ? first.buffer : null;
  if (!z.ok) return { ...empty, flags: [...flags, 'no_controls'] };
  return {
    zPrime: z.value.zPrime,
    band: z.value.band,
    robustZPrime: z.value.robustZPrime,
    robustBand: z.value.robustBand,
    positive: {
      variantId: first.variantId!,
      pH: first.pH!,
      buffer: first.buffer,
      wells: best.members.map((r) => r.well),
      mean: z.value.positive.mean,
      sd: z.value.positive.sd,
    },
    negative: {
      pH: first.pH!,
      buffer: negBuffer,
      wells: best.negatives.map((r) => r.well),
      mean: z.value.negative.mean,
      sd: z.value.negative.sd,
    },
    rule: Z_PRIME_RULE,
    flags: [...flags, ...z.value.flags],
  };
}
