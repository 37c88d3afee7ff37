// Differences between variants with their intervals. Data are generated here (bell model,
// SCIENCE.md §1.2, with seeded Gaussian noise); the truth is known, so the intervals can be checked.
import { describe, expect, it } from 'vitest';
import type { VariantProfile } from '../../../shared/analysis';
import { compareProfiles, difference, ratio, type ComparisonEntryInput } from '../../../shared/comparison/compare';
import { fitProfile, mulberry32 } from '../../../shared/fitting';

function generated(truth: { V: number; pKa1: number; pKa2: number }, seed: number, sd = 1.5) {
  const random = mulberry32(seed);
  const normal = () => Math.sqrt(-2 * Math.log(1 - random())) * Math.cos(2 * Math.PI * random());
  const pH: number[] = [];
  const v: number[] = [];
  for (let x = 2; x <= 9.001; x += 0.5) {
    for (let r = 0; r < 3; r += 1) {
      pH.push(Number(x.toFixed(2)));
      v.push(truth.V / (1 + 10 ** (truth.pKa1 - x) + 10 ** (x - truth.pKa2)) + sd * normal());
    }
  }
  return { pH, v };
}

function entry(name: string, data: { pH: number[]; v: number[] }, extra: Partial<ComparisonEntryInput> = {}): ComparisonEntryInput {
  const fit = fitProfile(data, { model: 'bell' });
  if (!fit.ok) throw new Error(fit.error.message);
  const profile = { variantId: name, name, fit: fit.value, error: null } as unknown as VariantProfile;
  return {
    studyId: 's1',
    studyName: 'generated',
    approved: true,
    variantId: name,
    variantName: name,
    assayId: 'a1',
    assayName: 'assay',
    temperatureC: 37,
    activityUnit: 'µmol/min/mg',
    profile,
    ...extra,
  };
}

describe('differences to the reference', () => {
  it('computes the delta-method difference by hand: d = 0.5, SE = √(0.1² + 0.2²) (common practice, no source)', () => {
    const d = difference({ value: 4.5, se: 0.1, ci95: null, boot95: null, dof: 1e6 }, { value: 4.0, se: 0.2, ci95: null, boot95: null, dof: 1e6 })!;
    expect(d.value).toBeCloseTo(0.5, 12);
    // With very large dof, t → 1.959964 (normal quantile, standard tables).
    expect(d.ci95![1] - d.value!).toBeCloseTo(1.959964 * Math.sqrt(0.05), 4);
    expect(d.clear).toBe(true);
  });

  it('computes a ratio interval on the log scale and calls 1 inside it unclear', () => {
    const r = ratio({ value: 110, se: 10, ci95: null, boot95: null, dof: 1e6 }, { value: 100, se: 10, ci95: null, boot95: null, dof: 1e6 })!;
    expect(r.value).toBeCloseTo(1.1, 12);
    expect(r.ci95![0]).toBeLessThan(1);
    expect(r.clear).toBe(false);
  });

  it('when a generated variant has a true acid shift of −0.6, then the pKa1 difference is clear and its interval holds the truth', () => {
    const parent = entry('parent', generated({ V: 100, pKa1: 3.7, pKa2: 6.3 }, 11));
    const shifted = entry('shifted', generated({ V: 95, pKa1: 3.1, pKa2: 6.3 }, 12));
    const result = compareProfiles([parent, shifted], 's1:parent');
    const row = result.rows.find((r) => r.variantName === 'shifted')!;
    const d = row.differences.pKa1!;
    expect(d.clear).toBe(true);
    expect(d.ci95![0]).toBeLessThanOrEqual(-0.6);
    expect(d.ci95![1]).toBeGreaterThanOrEqual(-0.6);
    expect(row.differences.pKa2!.clear).toBe(false);
  });

  it('when a generated variant differs by 0.03 in pKa1 with 5 % noise, then the shift is within error and not marked', () => {
    const parent = entry('parent', generated({ V: 100, pKa1: 3.7, pKa2: 6.3 }, 21, 5));
    const same = entry('same', generated({ V: 100, pKa1: 3.73, pKa2: 6.3 }, 22, 5));
    const row = compareProfiles([parent, same], 's1:parent').rows[1];
    expect(row.differences.pKa1!.clear).toBe(false);
    expect(row.differences.pHopt!.clear).toBe(false);
  });

  it('when studies differ in temperature, assay or units, then the row says it is not directly comparable', () => {
    const parent = entry('parent', generated({ V: 100, pKa1: 3.7, pKa2: 6.3 }, 31));
    const warm = entry('warm', generated({ V: 100, pKa1: 3.7, pKa2: 6.3 }, 32), { temperatureC: 50, assayId: 'a2', assayName: 'other', activityUnit: 'µM/min' });
    const row = compareProfiles([parent, warm], 's1:parent').rows[1];
    expect(row.comparability).toHaveLength(3);
    expect(row.differences.maxActivity).toBeNull();
  });
});
