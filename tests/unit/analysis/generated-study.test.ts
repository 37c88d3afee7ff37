// A GENERATED study (tests/fixtures/analysis/make-study.ts: invented data with known truth) through the
// whole analysis: rates against the true initial rates, blank correction, units, specific activity,
// and the fitted pKa values against the true ones.
import { describe, expect, it } from 'vitest';
import { analyseStudy, type AnalysisResult } from '../../../shared/analysis';
import { listWells } from '../../../shared/plate';
import { makeStudy, type GeneratedStudy } from '../../fixtures/analysis/make-study';
import { nonFinite } from './helpers';

function analysed(study: GeneratedStudy): AnalysisResult {
  const r = analyseStudy(study.input);
  if (!r.ok) throw new Error(r.error.message);
  return r.value;
}

describe('a generated kinetic study (bell profiles, Michaelis–Menten progress curves, drifting blanks)', () => {
  const study = makeStudy({ seed: 11 });
  const result = analysed(study);
  const samples = result.wells.filter((w) => w.role === 'sample');

  it('gives one row per mapped well, and plain JSON only', () => {
    const mapped = Object.keys(study.input.plates[0].map.wells).length;
    expect(result.wells).toHaveLength(mapped);
    expect(nonFinite(result)).toEqual([]);
    expect(JSON.parse(JSON.stringify(result))).toEqual(result);
  });

  it('states the units: A/min per well, µM/min of product, specific activity per mg', () => {
    // Every generated variant has a protein concentration and the enzyme volume is set (make-study.ts).
    expect(result.units).toMatchObject({
      signal: 'A/min',
      rate: 'µM/min',
      activity: 'µmol min⁻¹ mg⁻¹',
      activityKind: 'specific',
    });
    expect(result.units.note).toMatch(/^Specific activity/);
  });

  it('finds the true initial rates (well-windowed wells within 2 %, and ≥ 90 % of all wells within 3 SE)', () => {
    // Truth: make-study.ts v0 per well. Tolerance: the progress curves lose < 0.5 % of their slope over
    // the 10 min read (integrated Michaelis–Menten with S0 = Km = 20 mM, at most ~1.25 % conversion [derived])
    // plus read noise. Short automatic windows (≈ 1 trace in 20 on flat traces) are judged by their SE.
    let judged = 0;
    let within3Se = 0;
    for (const w of samples) {
      const truth = study.truth[`${w.plateId}:${w.well}`];
      expect(w.rate).not.toBeNull();
      if (Math.abs(w.rate! - truth.v0) <= 3 * w.rateSe!) within3Se++;
      if (truth.v0 > 5 && w.window!.endS! - w.window!.startS! >= 300) {
        judged++;
        expect(Math.abs(w.rate! - truth.v0) / truth.v0).toBeLessThan(0.02);
      }
    }
    expect(judged).toBeGreaterThan(100);
    expect(within3Se / samples.length).toBeGreaterThanOrEqual(0.9);
  });

  it('subtracts the mean of the blanks of the same plate, pH point and buffer', () => {
    for (const w of samples) {
      const blanks = result.wells.filter(
        (b) => b.role === 'blank' && b.plateId === w.plateId && b.pH === w.pH && b.buffer === w.buffer,
      );
      const mean = blanks.reduce((s, b) => s + b.signal!, 0) / blanks.length;
      expect(w.blank).toMatchObject({ match: 'same-buffer', n: 4 });
      expect(w.blank!.mean).toBeCloseTo(mean, 12);
      expect(w.corrected!).toBeCloseTo(w.signal! - mean, 12);
    }
    // Generated blanks run at 0.2 + 0.1·(pH − 3) µM/min (make-study.ts); their signal over ε·l is that rate.
    const blankAt = (pH: number) =>
      result.blanks.find((b) => b.pH === pH && b.plateIds[0] === 'plate-1' && b.buffer !== null)!;
    const perMicromolar = 6220 * 0.5 * 1e-6; // A per µM: ε·l, Beer–Lambert (SCIENCE.md §3.2)
    expect(blankAt(3).mean / perMicromolar).toBeCloseTo(0.2, 1);
    expect(blankAt(9.5).mean / perMicromolar).toBeCloseTo(0.85, 1);
  });

  it('converts by Beer–Lambert and per mg of protein', () => {
    const w = samples[0];
    const variant = study.variants.find((v) => v.id === w.variantId)!;
    // rate [µM/min] = (dA/dt [A/min])/(ε·l)·1e6 (SCIENCE.md §3.2); ε = 6220 M⁻¹cm⁻¹, l = 0.5 cm (make-study.ts)
    expect(w.rate!).toBeCloseTo((w.corrected! / (6220 * 0.5)) * 1e6, 10);
    // specific activity = rate·V_well / (c_protein·V_enzyme) (shared/plate specific-activity.ts):
    // µM/min · 200 µL · 1e-6 = µmol/min; mg = c [mg/mL] · 10 µL · 1e-3
    expect(w.activity!).toBeCloseTo((w.rate! * 200e-6) / (variant.proteinMgPerMl! * 10e-3), 10);
  });

  it('lists every replicate well of every pH point, and fits them all', () => {
    for (const p of result.profiles) {
      expect(p.points).toHaveLength(14);
      expect(p.points.every((pt) => pt.n === 4 && pt.sd !== null)).toBe(true);
      expect(p.fitData.pH).toHaveLength(56);
      expect(p.fit!.n).toBe(56);
      expect(p.fit!.residuals).toHaveLength(56);
      expect(p.curve!.pH.length).toBeGreaterThan(50);
      expect(p.relative!.curve.v.every((v) => v === null || v <= 1 + 1e-9)).toBe(true);
    }
    expect(result.profiles.find((p) => p.isReference)!.variantId).toBe('v-wt');
  });

  it('chooses the bell model by itself for most variants (the data are bell-shaped)', () => {
    const bells = result.profiles.filter((p) => p.selection?.model === 'bell').length;
    // Each profile faces two nested tests at α = 0.05 (bell → bell-plateau, bell → three): ≈ 10 % false picks.
    expect(bells).toBeGreaterThanOrEqual(3);
    for (const p of result.profiles) expect(p.selection!.candidates.length).toBe(5);
  });

  it('shows the plate map read without errors on this complete plate', () => {
    const checks = result.qc.plates[0].mapChecks;
    expect(checks.filter((c) => c.level === 'error')).toEqual([]);
    expect(checks.find((c) => c.code === 'no_role')!.wells.length).toBe(
      listWells(384).length - result.wells.length,
    );
  });
});

describe('fitted pKa values against the truth, over a fixed set of seeds', () => {
  it('fall inside their 95 % intervals about 95 % of the time', () => {
    // 10 generated studies × 4 variants × 2 pKa = 80 intervals, the bell model imposed (it is the truth).
    // Nominal misses: 4; Binomial(80, 0.05) gives P(misses ≥ 10) ≈ 0.007 [derived], so ≥ 10 misses
    // fails. Intervals must also stay narrow (median half-width < 0.1 pH) so that the test can fail.
    let misses = 0;
    const halfWidths: number[] = [];
    for (let seed = 1; seed <= 10; seed++) {
      const study = makeStudy({ seed });
      study.input.settings.models = Object.fromEntries(study.variants.map((v) => [v.id, 'bell' as const]));
      const result = analysed(study);
      for (const p of result.profiles) {
        const truth = study.variants.find((v) => v.id === p.variantId)!;
        for (const name of ['pKa1', 'pKa2'] as const) {
          const [lo, hi] = p.fit!.parameters[name].ci95!;
          halfWidths.push((hi - lo) / 2);
          if (!(lo <= truth[name] && truth[name] <= hi)) misses++;
        }
      }
    }
    expect(misses).toBeLessThan(10);
    halfWidths.sort((a, b) => a - b);
    expect(halfWidths[halfWidths.length / 2]).toBeLessThan(0.1);
  });
});
