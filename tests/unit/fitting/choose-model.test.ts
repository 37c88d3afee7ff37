import { describe, expect, it } from 'vitest';
import { chooseModel, fitProfile, type ModelId } from '@shared/fitting';
import { grid, simulate } from './helpers/simulate';

// Invented profiles, 25 points from pH 2 to 12 with Gaussian noise (helpers/simulate).
describe('model choice: the simplest adequate model', () => {
  const cases: [ModelId, number[], number][] = [
    ['acid', [50, 6], 1],
    ['base', [50, 7], 1],
    ['bell', [100, 5, 8], 2],
    ['bell-plateau', [30, 100, 10, 5, 8], 1],
    ['three', [100, 4, 5.5, 8.5], 1],
  ];
  for (const [model, theta, sd] of cases) {
    it(`proposes ${model} for data made by it`, () => {
      const r = chooseModel(simulate(model, theta, grid(2, 12, 25), sd, 3), { profile: false });
      if (!r.ok) throw new Error(r.error.message);
      expect(r.value.proposed).toBe(model);
      expect(r.value.fit.model).toBe(model);
    });
  }
  it('reports AICc, Akaike weights that sum to 1, and the nested F-tests it used', () => {
    const r = chooseModel(simulate('bell', [100, 5, 8], grid(2, 12, 25), 2, 3), { profile: false });
    if (!r.ok) throw new Error(r.error.message);
    const usable = r.value.candidates.filter((c) => c.usable);
    expect(usable.reduce((s, c) => s + (c.weight as number), 0)).toBeCloseTo(1, 12);
    expect(r.value.tests.some((t) => t.simpler === 'base' || t.simpler === 'acid')).toBe(true);
    const test = r.value.tests.find((t) => t.complex === 'bell');
    expect(test?.pValue).toBeLessThan(0.05);
    expect(test?.df1).toBe(1);
  });
  it('does not count a bell whose pKa ran out of one-limb data as a better model', () => {
    const r = chooseModel(simulate('acid', [50, 6], grid(3, 9, 15), 1, 4), { profile: false });
    if (!r.ok) throw new Error(r.error.message);
    expect(r.value.proposed).toBe('acid');
    expect(r.value.candidates.find((c) => c.model === 'bell')?.usable).toBe(false);
  });
});

describe("fitProfile with model 'auto'", () => {
  it('returns the proposed model’s fit and how it was chosen', () => {
    const r = fitProfile(simulate('acid', [50, 6], grid(2, 12, 25), 1, 3), { model: 'auto', profile: false });
    if (!r.ok) throw new Error(r.error.message);
    expect(r.value.model).toBe('acid');
    expect(r.value.selection?.proposed).toBe('acid');
    expect(r.value.selection?.candidates.map((c) => c.model)).toEqual([
      'acid',
      'base',
      'bell',
      'bell-plateau',
      'three',
    ]);
  });
  it('is null for a fit of a named model', () => {
    const r = fitProfile(simulate('acid', [50, 6], grid(2, 12, 25), 1, 3), { model: 'acid', profile: false });
    expect(r.ok && r.value.selection).toBeNull();
  });
});
