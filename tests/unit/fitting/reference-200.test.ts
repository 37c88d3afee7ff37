import { describe, expect, it } from 'vitest';
import { fitProfile, type ProfileFit } from '@shared/fitting';
import { readReference, rel, type RefDataset, type RefFit } from './helpers/reference';

// Reference: tests/fixtures/reference (copied from shared/reference): bell-200.json (200 generated
// profiles, numpy seed 1), bell-200.exact.json (exact minima of the 170 profiles with a finite
// minimum and both pKa within 2 units of the data), bell-200.scipy.json (scipy 1.10.1 curve_fit),
// bell-200.r.json (R 4.2.2 nls), bell-200.scipy-acid.json / -base.json (one-limb fits by scipy).
const data = readReference<{ datasets: RefDataset[] }>('bell-200.json').datasets;
const exact = new Map(
  readReference<{ results: RefFit[] }>('bell-200.exact.json').results.map((r) => [r.id, r]),
);
const scipy = new Map(
  readReference<{ results: RefFit[] }>('bell-200.scipy.json').results.map((r) => [r.id, r]),
);
const rfits = new Map(readReference<{ results: RefFit[] }>('bell-200.r.json').results.map((r) => [r.id, r]));
const scipyAcid = readReference<{ results: RefFit[] }>('bell-200.scipy-acid.json').results;
const scipyBase = readReference<{ results: RefFit[] }>('bell-200.scipy-base.json').results;

const fits = new Map<string, ProfileFit>();
for (const d of data) {
  const r = fitProfile(d, { model: 'bell', profile: false, alternative: true });
  if (r.ok) fits.set(d.id, r.value);
}
const value = (f: ProfileFit, name: string): number => f.parameters[name].value as number;
const maxRel = (f: ProfileFit, ref: RefFit): number =>
  Math.max(
    rel(value(f, 'V'), ref.V as number),
    rel(value(f, 'pKa1'), ref.pKa1 as number),
    rel(value(f, 'pKa2'), ref.pKa2 as number),
  );

describe('bell model against the reference fits of bell-200', () => {
  it('fits every profile', () => {
    expect(fits.size).toBe(200);
  });

  it('matches the exact minimum within 1e-6 relative on at least 99.5 % of the 170 (bell-200.exact.json)', () => {
    let agree = 0;
    for (const [id, ref] of exact) {
      const f = fits.get(id) as ProfileFit;
      if (f.converged && maxRel(f, ref) <= 1e-6) agree++;
    }
    expect(exact.size).toBe(170);
    expect(agree / exact.size).toBeGreaterThanOrEqual(0.995);
  });

  it('matches scipy and R within 1e-6 relative where they found that minimum (bell-200.scipy.json, bell-200.r.json)', () => {
    for (const refs of [scipy, rfits]) {
      let agree = 0;
      let total = 0;
      for (const id of exact.keys()) {
        const ref = refs.get(id) as RefFit;
        if (!ref.converged || ref.V === null) continue;
        total++;
        if (maxRel(fits.get(id) as ProfileFit, ref) <= 1e-6) agree++;
      }
      expect(agree / total).toBeGreaterThanOrEqual(0.995);
    }
  });

  it('gives the same standard errors, pHopt and its delta-method SE as the exact file (bell-200.exact.json)', () => {
    for (const [id, ref] of exact) {
      const f = fits.get(id) as ProfileFit;
      for (const name of ['V', 'pKa1', 'pKa2'])
        expect(rel(f.parameters[name].se as number, ref.se?.[name] as number)).toBeLessThan(1e-5);
      expect(rel(f.pHopt.value as number, ref.pHopt as number)).toBeLessThan(1e-6);
      expect(rel(f.pHopt.se as number, ref.pHopt_se as number)).toBeLessThan(1e-5);
      expect(rel(f.ssr as number, ref.ssr as number)).toBeLessThan(1e-9);
    }
  });

  it('reports a runaway pKa as null with a flag, and V, the seen pKa and SSR as scipy and R found them', () => {
    // one-limb profiles: scipy ran the unseen pKa to ±∞ (|pKa| far outside the data) and R stopped
    // with "singular convergence"; V, the other pKa and the SSR still agree between them
    let checked = 0;
    for (const d of data) {
      const ref = scipy.get(d.id) as RefFit;
      if (exact.has(d.id) || !ref.converged) continue;
      const lo = Math.min(...d.pH);
      const hi = Math.max(...d.pH);
      const unseen = (ref.pKa2 as number) > hi + 5 ? 'pKa2' : (ref.pKa1 as number) < lo - 5 ? 'pKa1' : null;
      if (!unseen) continue;
      const seen = unseen === 'pKa2' ? 'pKa1' : 'pKa2';
      const f = fits.get(d.id) as ProfileFit;
      expect(f.parameters[unseen].value).toBeNull();
      expect(f.flags.map((x) => x.code)).toContain(`${unseen}_not_determined`);
      expect(f.pHopt.value).toBeNull();
      expect(rel(value(f, 'V'), ref.V as number)).toBeLessThan(1e-6);
      expect(rel(value(f, seen), ref[seen] as number)).toBeLessThan(1e-6);
      expect(rel(f.ssr as number, ref.ssr as number)).toBeLessThan(1e-8);
      const r = rfits.get(d.id) as RefFit;
      expect(rel(value(f, 'V'), r.V as number)).toBeLessThan(1e-6);
      expect(rel(f.ssr as number, r.ssr as number)).toBeLessThan(1e-8);
      // the one-limb fit is offered
      expect(f.alternative?.model).toBe(unseen === 'pKa2' ? 'acid' : 'base');
      checked++;
    }
    expect(checked).toBeGreaterThanOrEqual(20);
  });

  it('never reports a pKa more than 2 units beyond the measured range', () => {
    for (const d of data) {
      const f = fits.get(d.id) as ProfileFit;
      for (const name of ['pKa1', 'pKa2']) {
        const v = f.parameters[name].value;
        if (v !== null) {
          expect(v).toBeGreaterThanOrEqual(Math.min(...d.pH) - 2);
          expect(v).toBeLessThanOrEqual(Math.max(...d.pH) + 2);
        }
      }
    }
  });

  it("agrees with scipy's one-limb fits for the 'acid' and 'base' models (bell-200.scipy-acid/-base.json)", () => {
    for (const [model, refs] of [
      ['acid', scipyAcid],
      ['base', scipyBase],
    ] as const) {
      let agree = 0;
      let total = 0;
      for (const ref of refs) {
        const d = data.find((x) => x.id === ref.id) as RefDataset;
        const lo = Math.min(...d.pH);
        const hi = Math.max(...d.pH);
        // the reference's answer is a finite minimum with its pKa inside or near the data
        if (
          !ref.converged ||
          ref.pKa === null ||
          (ref.pKa as number) < lo - 2 ||
          (ref.pKa as number) > hi + 2
        )
          continue;
        total++;
        const f = fitProfile(d, { model, profile: false });
        if (!f.ok) continue;
        const ok =
          rel(f.value.parameters.V.value as number, ref.V as number) <= 1e-6 &&
          rel(f.value.parameters.pKa.value as number, ref.pKa as number) <= 1e-6 &&
          rel(f.value.ssr as number, ref.ssr as number) <= 1e-8;
        if (ok) agree++;
      }
      expect(total).toBeGreaterThan(100);
      expect(agree / total).toBeGreaterThanOrEqual(0.995);
    }
  });
});
