import { describe, expect, it } from 'vitest';
import { fitGlobal, fitProfile } from '@shared/fitting';
import { grid, simulate } from './helpers/simulate';

// Invented variants: 15 points from pH 3 to 10, noise sd 2 (helpers/simulate).
const pH = grid(3, 10, 15);
const wt = { id: 'WT', ...simulate('bell', [100, 5, 8], pH, 2, 1) };
const sameAcidSide = { id: 'V1', ...simulate('bell', [60, 5, 7], pH, 2, 2) };
const movedAcidSide = { id: 'V2', ...simulate('bell', [60, 6, 7], pH, 2, 2) };

describe('global fits with shared parameters', () => {
  it('shares one pKa1 and keeps the other parameters per variant', () => {
    const r = fitGlobal([wt, sameAcidSide], { model: 'bell', shared: ['pKa1'] });
    if (!r.ok) throw new Error(r.error.message);
    const g = r.value;
    expect(g.converged).toBe(true);
    expect(Math.abs((g.sharedParameters.pKa1.value as number) - 5)).toBeLessThan(0.1);
    expect(g.datasets.map((d) => d.id)).toEqual(['WT', 'V1']);
    expect(g.datasets[0].parameters.pKa1.value).toBe(g.sharedParameters.pKa1.value);
    expect(g.datasets[0].parameters.pKa1.shared).toBe(true);
    expect(g.datasets[1].parameters.pKa2.shared).toBe(false);
    expect(Math.abs((g.datasets[0].parameters.pKa2.value as number) - 8)).toBeLessThan(0.1);
    expect(Math.abs((g.datasets[1].parameters.pKa2.value as number) - 7)).toBeLessThan(0.1);
    expect(g.nFitted).toBe(5);
    expect(g.dof).toBe(30 - 5);
  });
  it('prefers the shared description when the variants share the pKa (F-test not significant)', () => {
    const r = fitGlobal([wt, sameAcidSide], { shared: ['pKa1'] });
    if (!r.ok) throw new Error(r.error.message);
    expect(r.value.comparison.df1).toBe(1);
    expect(r.value.comparison.pValue).toBeGreaterThan(0.05);
    expect(r.value.comparison.preferred).toBe('shared');
    // and the separate sum of squares is the sum of the single fits
    const single = [wt, sameAcidSide].map((d) => fitProfile(d, { profile: false }));
    const sum = single.reduce((s, f) => s + (f.ok ? (f.value.ssr as number) : NaN), 0);
    expect(r.value.comparison.separate.ssr).toBeCloseTo(sum, 6);
    expect(r.value.ssr as number).toBeGreaterThanOrEqual(sum);
  });
  it('prefers separate fits when the pKa moved (F-test significant)', () => {
    const r = fitGlobal([wt, movedAcidSide], { shared: ['pKa1'] });
    if (!r.ok) throw new Error(r.error.message);
    expect(r.value.comparison.pValue).toBeLessThan(0.001);
    expect(r.value.comparison.preferred).toBe('separate');
  });
  it('gives each variant its optimum with a delta-method SE', () => {
    const r = fitGlobal([wt, sameAcidSide], { shared: ['pKa1'] });
    if (!r.ok) throw new Error(r.error.message);
    for (const d of r.value.datasets) {
      const [k1, k2] = [d.parameters.pKa1.value as number, d.parameters.pKa2.value as number];
      expect(d.pHopt.value).toBeCloseTo((k1 + k2) / 2, 12);
      expect(d.pHopt.se).toBeGreaterThan(0);
    }
  });
});
