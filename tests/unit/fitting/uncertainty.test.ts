import { describe, expect, it } from 'vitest';
import { curveWithBand, fitCurve, fitProfile, studentTQuantile, type ProfileFit } from '@shared/fitting';
import { grid, simulate } from './helpers/simulate';
import { readReference, type RefDataset } from './helpers/reference';

const bell200 = readReference<{ datasets: RefDataset[] }>('bell-200.json').datasets;
const s00000 = bell200.find((d) => d.id === 's1-00000') as RefDataset; // bell-200.json, both limbs
const unwrap = (r: ReturnType<typeof fitProfile>): ProfileFit => {
  if (!r.ok) throw new Error(r.error.message);
  return r.value;
};

describe('standard errors and Wald intervals', () => {
  const fit = unwrap(fitProfile(s00000, { profile: false }));
  it('ci95 = value ± t(0.975, n − p)·SE', () => {
    const t = studentTQuantile(0.975, fit.dof);
    for (const name of fit.parameterNames) {
      const p = fit.parameters[name];
      expect(p.ci95?.[0]).toBeCloseTo((p.value as number) - t * (p.se as number), 12);
      expect(p.ci95?.[1]).toBeCloseTo((p.value as number) + t * (p.se as number), 12);
    }
  });
  it('covariance is symmetric, its diagonal gives the SEs, correlations lie in [−1, 1] with unit diagonal', () => {
    fit.parameterNames.forEach((a, i) => {
      expect(Math.sqrt(fit.covariance[i][i] as number)).toBeCloseTo(fit.parameters[a].se as number, 12);
      expect(fit.correlation[i][i]).toBeCloseTo(1, 12);
      fit.parameterNames.forEach((_, j) => {
        expect(fit.covariance[i][j]).toBeCloseTo(fit.covariance[j][i] as number, 14);
        expect(Math.abs(fit.correlation[i][j] as number)).toBeLessThanOrEqual(1 + 1e-12);
      });
    });
  });
  it('the delta-method SEs of the window ends agree with numerical propagation through the covariance', () => {
    // independent check: finite differences of the window ends, propagated with the covariance
    const [V, k1, k2] = ['V', 'pKa1', 'pKa2'].map((n) => fit.parameters[n].value as number);
    const lo = (a: number, b: number) => {
      const d = b - a;
      const S = 10 ** (d / 2) + 4;
      return (a + b) / 2 - Math.log10((S + Math.sqrt(S * S - 4)) / 2);
    };
    const h = 1e-6;
    const g = [0, (lo(k1 + h, k2) - lo(k1 - h, k2)) / (2 * h), (lo(k1, k2 + h) - lo(k1, k2 - h)) / (2 * h)];
    let v = 0;
    for (let i = 0; i < 3; i++)
      for (let j = 0; j < 3; j++) v += g[i] * (fit.covariance[i][j] as number) * g[j];
    expect(fit.window.lo.value).toBeCloseTo(lo(k1, k2), 10);
    expect(fit.window.lo.se).toBeCloseTo(Math.sqrt(v), 7);
    expect(V).toBeGreaterThan(0);
  });
});

describe('profile-likelihood intervals', () => {
  const fit = unwrap(fitProfile(s00000));
  it('exist for V, pKa1, pKa2 and Δ, close to the Wald intervals for a well-determined bell', () => {
    for (const name of fit.parameterNames) {
      const p = fit.parameters[name];
      const [a, b] = p.profile95 as [number, number];
      const half = (p.ci95?.[1] as number) - (p.value as number);
      expect(a).toBeLessThan(p.value as number);
      expect(b).toBeGreaterThan(p.value as number);
      expect(Math.abs(a - (p.ci95?.[0] as number))).toBeLessThan(0.1 * half);
      expect(Math.abs(b - (p.ci95?.[1] as number))).toBeLessThan(0.1 * half);
    }
    expect(fit.delta?.profile95?.[0]).toBeLessThan(fit.delta?.value as number);
    expect(fit.delta?.profile95?.[1]).toBeGreaterThan(fit.delta?.value as number);
  });
  it('end where the refitted sum of squares has risen by s²·t² (checked by an independent constrained fit)', () => {
    const s2 = fit.s2 as number;
    const t = studentTQuantile(0.975, fit.dof);
    const end = fit.parameters.pKa1.profile95?.[1] as number;
    // V and pKa2 refitted with pKa1 held at the interval's end, by the generic solver
    const bell = (pH: number, b: ArrayLike<number>) => b[0] / (1 + 10 ** (end - pH) + 10 ** (pH - b[1]));
    const held = fitCurve(
      { x: s00000.pH, y: s00000.v },
      { names: ['V', 'pKa2'], f: bell },
      { start: [32, 8.2] },
    );
    if (!held.ok) throw new Error(held.error.message);
    expect(((held.value.ssr as number) - (fit.ssr as number)) / (s2 * t * t)).toBeCloseTo(1, 5);
  });
  it('are open (null) on the side where a pKa beyond the edge of the data is not bounded', () => {
    // invented: data pH 3–7.2 (12 points), true pKa 5 and 8, noise sd 5 (seed 13): pKa2 lies
    // beyond the data; the profile rises enough below it but never above it
    const f = unwrap(fitProfile(simulate('bell', [100, 5, 8], grid(3, 7.2, 12), 5, 13)));
    const p = f.parameters.pKa2;
    expect(p.status).toBe('fitted');
    expect(f.flags.map((x) => x.code)).toContain('pKa2_outside_range');
    expect(p.profile95?.[0]).toBeLessThan(p.value as number);
    expect(p.profile95?.[1]).toBeNull();
    // while the Wald interval is symmetric and closed
    expect(p.ci95).not.toBeNull();
  });
});

describe('residual bootstrap', () => {
  it('is reproducible with a seed, differs with another, and brackets the estimates', () => {
    const a = unwrap(fitProfile(s00000, { profile: false, bootstrap: 300, seed: 7 }));
    const b = unwrap(fitProfile(s00000, { profile: false, bootstrap: 300, seed: 7 }));
    const c = unwrap(fitProfile(s00000, { profile: false, bootstrap: 300, seed: 8 }));
    expect(a.pHopt.boot95).toEqual(b.pHopt.boot95);
    expect(a.pHopt.boot95).not.toEqual(c.pHopt.boot95);
    const [lo, hi] = a.pHopt.boot95 as [number, number];
    expect(lo).toBeLessThan(a.pHopt.value as number);
    expect(hi).toBeGreaterThan(a.pHopt.value as number);
    // and agrees in width with the delta method for this well-determined profile
    expect((hi - lo) / ((a.pHopt.ci95?.[1] as number) - (a.pHopt.ci95?.[0] as number))).toBeGreaterThan(0.7);
    expect((hi - lo) / ((a.pHopt.ci95?.[1] as number) - (a.pHopt.ci95?.[0] as number))).toBeLessThan(1.3);
    for (const end of ['lo', 'hi', 'width'] as const) expect(a.window[end].boot95).not.toBeNull();
    expect(a.bootstrap).toEqual({ resamples: 300, seed: 7, undetermined: 0 });
  });
  it('runs 1,000 resamples by the caller’s count', () => {
    const f = unwrap(fitProfile(s00000, { profile: false, bootstrap: 1000 }));
    expect(f.bootstrap?.resamples).toBe(1000);
  });
});

describe('coverage of the 95 % intervals on simulated profiles', () => {
  it('pKa1 and pHopt intervals contain the truth in about 95 % of 300 invented data sets (SCIENCE.md §1.7 design: 7 points pH 4–10, 5 % noise)', () => {
    let inPKa = 0;
    let inOpt = 0;
    const runs = 300;
    for (let s = 0; s < runs; s++) {
      const f = unwrap(
        fitProfile(simulate('bell', [100, 5, 8], grid(4, 10, 7), 5, 1000 + s), { profile: false }),
      );
      const [a, b] = f.parameters.pKa1.ci95 ?? [NaN, NaN];
      if (a <= 5 && 5 <= b) inPKa++;
      const [c, d] = f.pHopt.ci95 ?? [NaN, NaN];
      if (c <= 6.5 && 6.5 <= d) inOpt++;
    }
    // binomial(300, 0.95): 95 % of outcomes lie within ±2.5 percentage points
    expect(inPKa / runs).toBeGreaterThan(0.91);
    expect(inPKa / runs).toBeLessThan(0.99);
    expect(inOpt / runs).toBeGreaterThan(0.91);
    expect(inOpt / runs).toBeLessThan(0.99);
  });
});

describe('curveWithBand', () => {
  const fit = unwrap(fitProfile(s00000, { profile: false }));
  it('gives the curve and a band that contains it, narrowest near the data and from data − 0.5 to data + 0.5', () => {
    const r = curveWithBand(fit, { points: 41 });
    if (!r.ok) throw new Error(r.error.message);
    const band = r.value;
    expect(band.pH[0]).toBeCloseTo(fit.pHRange[0] - 0.5, 12);
    expect(band.pH[40]).toBeCloseTo(fit.pHRange[1] + 0.5, 12);
    band.v.forEach((v, i) => {
      expect(band.lower[i] as number).toBeLessThanOrEqual(v as number);
      expect(band.upper[i] as number).toBeGreaterThanOrEqual(v as number);
    });
  });
  it('at the optimum equals the fitted peak with the delta-method half-width t·SE(peak)', () => {
    const opt = fit.pHopt.value as number;
    const r = curveWithBand(fit, { from: opt - 1, to: opt + 1, points: 3 });
    if (!r.ok) throw new Error(r.error.message);
    expect(r.value.v[1]).toBeCloseTo(fit.peak.value as number, 9);
    // at pHopt ∂v/∂pHopt = 0, so the band there is the peak's own interval
    expect(r.value.upper[1]).toBeCloseTo(fit.peak.ci95?.[1] as number, 6);
  });
  it('draws the one-limb curve when a pKa is not determined', () => {
    const oneLimb = bell200.find((d) => d.id === 's1-00004') as RefDataset; // acid limb only
    const f = unwrap(fitProfile(oneLimb, { profile: false }));
    expect(f.parameters.pKa2.value).toBeNull();
    const r = curveWithBand(f);
    if (!r.ok) throw new Error(r.error.message);
    expect(r.value.v.every((v) => v !== null)).toBe(true);
    expect(r.value.upper.every((v) => v !== null)).toBe(true);
  });
});

describe("detail 'summary' (bulk runs)", () => {
  it('gives the same parameters, SEs, optimum and flags as the full report, without the tables', () => {
    for (const d of bell200.slice(0, 40)) {
      const full = unwrap(fitProfile(d, { profile: false }));
      const summary = unwrap(fitProfile(d, { profile: false, detail: 'summary' }));
      expect(summary.parameters).toEqual(full.parameters);
      expect(summary.pHopt).toEqual(full.pHopt);
      expect(summary.flags).toEqual(full.flags);
      expect(summary.ssr).toBe(full.ssr);
      expect(summary.window.lo.value).toBe(full.window.lo.value);
      expect(summary.residuals).toEqual([]);
      expect(summary.covariance).toEqual([]);
      expect(summary.window.lo.se).toBeNull();
    }
  });
});
