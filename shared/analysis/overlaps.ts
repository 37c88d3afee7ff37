/**
 * Overlap points (SCIENCE.md §2.6): the same variant at the same pH in two buffer systems. When the
 * two disagree beyond their errors the buffer itself acts on the enzyme (activation, inhibition, metal
 * binding). Test: Welch's t test (shared/stats welchTTest) on the non-excluded wells' activities of
 * the two buffers, flagged at α = 0.05. Pairs read on different plates are tested too, and marked:
 * plate-to-plate differences are then mixed into the comparison.
 */
import { mean, sampleStandardDeviation } from 'simple-statistics';
import { welchTTest } from '../stats';
import { phKey } from './blanks';
import { num } from './result';
import type { OverlapTest, WellRow } from './types';

export const OVERLAP_ALPHA = 0.05;

const sd = (v: number[]): number | null => (v.length > 1 ? num(sampleStandardDeviation(v)) : null);

export function overlapTests(rows: readonly WellRow[], alpha = OVERLAP_ALPHA): OverlapTest[] {
  const byPoint = new Map<string, Map<string, WellRow[]>>();
  for (const r of rows) {
    if (
      r.role !== 'sample' ||
      r.excluded ||
      r.activity === null ||
      r.pH === null ||
      !r.variantId ||
      !r.buffer
    )
      continue;
    const key = `${r.variantId}|${phKey(r.pH)}`;
    const buffers = byPoint.get(key) ?? new Map<string, WellRow[]>();
    buffers.set(r.buffer, [...(buffers.get(r.buffer) ?? []), r]);
    byPoint.set(key, buffers);
  }
  const out: OverlapTest[] = [];
  for (const [key, buffers] of byPoint) {
    const names = [...buffers.keys()].sort();
    for (let i = 0; i < names.length; i++) {
      for (let j = i + 1; j < names.length; j++) {
        const a = buffers.get(names[i])!;
        const b = buffers.get(names[j])!;
        const va = a.map((r) => r.activity!);
        const vb = b.map((r) => r.activity!);
        const test = welchTTest(va, vb);
        const plates = [...new Set([...a, ...b].map((r) => r.plateId))];
        out.push({
          variantId: key.split('|')[0],
          pH: a[0].pH!,
          buffers: [names[i], names[j]],
          means: [mean(va), mean(vb)],
          sds: [sd(va), sd(vb)],
          ns: [va.length, vb.length],
          difference: mean(va) - mean(vb),
          t: num(test?.t),
          dof: num(test?.dof),
          p: num(test?.p),
          flagged: test !== null && test.p < alpha,
          samePlate: plates.length === 1,
          plateIds: plates,
        });
      }
    }
  }
  return out;
}
