import { describe, expect, it } from 'vitest';
import { fitProfile, type FitOptions, type ProfileFit } from '@shared/fitting';
import { readReference, type RefDataset } from './helpers/reference';
import { grid, simulate } from './helpers/simulate';

// Invented profiles (helpers/simulate: model + seeded Gaussian noise) and bell-200.json profiles.
const codes = (input: { pH: number[]; v: number[] }, options: FitOptions = {}): string[] => {
  const r = fitProfile(input, { profile: false, ...options });
  if (!r.ok) throw new Error(r.error.message);
  return r.value.flags.map((f) => f.code);
};
const bell200 = readReference<{ datasets: RefDataset[] }>('bell-200.json').datasets;
const byId = (id: string) => bell200.find((d) => d.id === id) as RefDataset;

describe('flags', () => {
  it('no flags on a well-designed profile (pKa 5 and 8, 15 points from pH 3 to 10, 1 % noise)', () => {
    expect(codes(simulate('bell', [100, 5, 8], grid(3, 10, 15), 1, 5))).toEqual([]);
  });
  it('pKa_too_close and narrow_bell when pKa 6.3 and 6.7 (SCIENCE.md §1.7 row 4)', () => {
    expect(codes(simulate('bell', [100, 6.3, 6.7], grid(4, 10, 13), 3, 5))).toEqual([
      'pKa_too_close',
      'narrow_bell',
    ]);
  });
  it('narrow_bell alone when Δ = 1.5 is still resolved (SCIENCE.md §1.7: Δ < ~2)', () => {
    expect(codes(simulate('bell', [100, 6, 7.5], grid(4, 10, 13), 1, 5))).toEqual(['narrow_bell']);
  });
  it('pKa2_outside_range when the fitted pKa2 lies beyond the data (bell-200.json s1-00003: data to pH 7.11, pKa2 8.4)', () => {
    expect(codes(byId('s1-00003'))).toContain('pKa2_outside_range');
  });
  it('pKa2_not_determined when the data show one limb (bell-200.json s1-00004), with the one-limb fit offered', () => {
    const r = fitProfile(byId('s1-00004'), { profile: false });
    if (!r.ok) throw new Error(r.error.message);
    const fit: ProfileFit = r.value;
    expect(fit.flags.map((f) => f.code)).toContain('pKa2_not_determined');
    expect(fit.flags.find((f) => f.code === 'pKa2_not_determined')?.message).toMatch(/not determined/);
    expect(fit.parameters.pKa2).toMatchObject({
      value: null,
      se: null,
      ci95: null,
      status: 'not_determined',
    });
    expect(fit.pHopt.value).toBeNull();
    expect(fit.window.lo.value).toBe(fit.parameters.pKa1.value); // rising limb: half activity at pKa1
    expect(fit.window.hi.value).toBeNull(); // open towards high pH
    expect(fit.alternative?.model).toBe('acid');
    expect(fit.alternative?.parameters.pKa.value).toBeCloseTo(fit.parameters.pKa1.value as number, 9);
    expect(fit.dof).toBe(fit.n - 2);
  });
  it('too_few_points with 8 points for 3 parameters (common practice, no source: ≥ 3 per parameter)', () => {
    expect(codes(simulate('bell', [100, 5, 8], grid(3, 10, 8), 1, 5))).toEqual(['too_few_points']);
  });
  it('residual_runs (Wald–Wolfowitz) when a one-limb model is fitted to a bell', () => {
    expect(codes(simulate('bell', [100, 5, 8], grid(3, 10, 15), 1, 5), { model: 'acid' })).toContain(
      'residual_runs',
    );
  });
  it('not_converged when the solver stops at its iteration limit', () => {
    expect(codes(simulate('bell', [100, 5, 8], grid(3, 10, 15), 1, 5), { maxIterations: 1 })).toContain(
      'not_converged',
    );
  });
  it('V_lo_extrapolated and V_hi_extrapolated when the data stop short of the plateaus (SCIENCE.md §1.3)', () => {
    const c = codes(simulate('bell-plateau', [20, 100, 5, 5, 8], grid(4, 9, 15), 1, 5), {
      model: 'bell-plateau',
    });
    expect(c).toEqual(['V_lo_extrapolated', 'V_hi_extrapolated']);
  });
  it('pKa1 = pKa2 with pKa_too_close where the unconstrained minimum would cross them (bell-5000 s2-00900 kind)', () => {
    // invented: a curve narrower than any bell with pKa1 ≤ pKa2 (slopes ±2 made by three ionizations)
    const data = simulate('three', [100, 5.8, 6, 6.4], grid(4, 9, 21), 0.5, 3);
    const r = fitProfile(data, { profile: false });
    if (!r.ok) throw new Error(r.error.message);
    expect(r.value.parameters.pKa1.value as number).toBeLessThanOrEqual(
      r.value.parameters.pKa2.value as number,
    );
    expect(r.value.flags.map((f) => f.code)).toContain('pKa_too_close');
  });
  it('both pKa values not determined on flat data (V is their mean) and on all-zero data (V = 0)', () => {
    const pH = grid(4, 9, 10);
    const flat = fitProfile({ pH, v: [5, 5.1, 4.9, 5, 5.05, 4.95, 5, 5.02, 4.98, 5] }, { profile: false });
    const zero = fitProfile({ pH, v: new Array<number>(10).fill(0) }, { profile: false });
    if (!flat.ok || !zero.ok) throw new Error('fit failed');
    expect(flat.value.parameters.V.value).toBeCloseTo(5, 9);
    expect(zero.value.parameters.V.value).toBe(0);
    for (const f of [flat.value, zero.value]) {
      expect(f.parameters.pKa1.value).toBeNull();
      expect(f.parameters.pKa2.value).toBeNull();
      expect(f.pHopt.value).toBeNull();
      expect(f.flags.map((x) => x.code)).toEqual(
        expect.arrayContaining(['pKa1_not_determined', 'pKa2_not_determined']),
      );
    }
  });
  it('V is not determined either when a pKa runs off on the side where no simpler model waits', () => {
    // invented: pure exponential rise 10^(pH − 6) from pH 4 to 6, no sign of a plateau
    const pH = grid(4, 6, 8);
    const codes = fitProfile({ pH, v: pH.map((x) => 10 ** (x - 6)) }, { profile: false });
    if (!codes.ok) throw new Error(codes.error.message);
    expect(codes.value.parameters.V.value).toBeNull();
    expect(codes.value.flags.map((x) => x.code)).toContain('V_not_determined');
  });
});
