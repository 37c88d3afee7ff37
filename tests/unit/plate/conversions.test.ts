import { describe, expect, it } from 'vitest';
import {
  absorbingFraction,
  concentrationFromAbsorbance,
  concentrationFromSignal,
  effectiveExtinction,
  fitStandardCurve,
  pathLengthFromVolume,
  rateFromAbsorbanceSlope,
  rateFromSignalSlope,
  specificActivity,
  type PlateResult,
} from '@shared/plate';
import { seededNormal } from './progress-curve';

function value<T>(r: PlateResult<T>): T {
  if (!r.ok) throw new Error(r.error.message);
  return r.value;
}

const NADH = { value: 6220, unit: 'M-1cm-1' } as const; // NADH at 340 nm, SCIENCE.md §3.2 [pub]

describe('Beer–Lambert', () => {
  it('turns 0.0622 A/min at 1 cm with NADH ε = 6220 M⁻¹cm⁻¹ into 10 µM/min [derived, SCIENCE.md §3.2]', () => {
    const r = value(
      rateFromAbsorbanceSlope(0.0622, { epsilon: NADH, pathLengthCm: 1, timeUnit: 'min', slopeSe: 0.00622 }),
    );
    expect(r.micromolarPerMinute).toBeCloseTo(10, 10);
    expect(r.molarPerSecond).toBeCloseTo(1e-5 / 60, 18);
    expect(r.seMicromolarPerMinute!).toBeCloseTo(1, 10);
  });

  it('gives the same rate from a per-second slope and from ε in mM⁻¹cm⁻¹ (6.22)', () => {
    const r = value(
      rateFromAbsorbanceSlope(0.0622 / 60, {
        epsilon: { value: 6.22, unit: 'mM-1cm-1' },
        pathLengthCm: 1,
        timeUnit: 's',
      }),
    );
    expect(r.micromolarPerMinute).toBeCloseTo(10, 10);
    expect(r.seMolarPerSecond).toBeNull();
  });

  it('halves the concentration when the path doubles: A = 0.622 at 2 cm is 50 µM [derived]', () => {
    expect(
      value(concentrationFromAbsorbance(0.622, { epsilon: NADH, pathLengthCm: 2 })).micromolar,
    ).toBeCloseTo(50, 10);
  });

  it('refuses units it does not know, zero path lengths and non-numbers', () => {
    expect(
      rateFromAbsorbanceSlope(0.1, {
        epsilon: { value: 6220, unit: 'cm' as never },
        pathLengthCm: 1,
        timeUnit: 'min',
      }).ok,
    ).toBe(false);
    expect(rateFromAbsorbanceSlope(0.1, { epsilon: NADH, pathLengthCm: 0, timeUnit: 'min' }).ok).toBe(false);
    expect(rateFromAbsorbanceSlope(0.1, { epsilon: NADH, pathLengthCm: 1, timeUnit: 'h' as never }).ok).toBe(
      false,
    );
    expect(rateFromAbsorbanceSlope(Number.NaN, { epsilon: NADH, pathLengthCm: 1, timeUnit: 'min' }).ok).toBe(
      false,
    );
    expect(concentrationFromAbsorbance(0.1, undefined as never).ok).toBe(false);
  });

  it('computes l = V/area: 200 µL in a round well of 6.4 mm is 0.6217 cm, flagged for the meniscus [derived]', () => {
    // 200 mm³ / (π·3.2² mm²) = 6.21699 mm (a generated example, not a plate specification)
    const r = value(pathLengthFromVolume({ volumeUl: 200, wellDiameterMm: 6.4 }));
    expect(r.pathLengthCm).toBeCloseTo(0.621699, 6);
    expect(r.flags).toEqual(['meniscus_not_corrected']);
    expect(value(pathLengthFromVolume({ volumeUl: 50, wellAreaMm2: 10 })).pathLengthCm).toBeCloseTo(0.5, 12);
    expect(pathLengthFromVolume({ volumeUl: 200 }).ok).toBe(false);
    expect(pathLengthFromVolume({ volumeUl: -1, wellDiameterMm: 6 }).ok).toBe(false);
  });
});

describe('pH-dependent extinction of an ionising chromophore', () => {
  it('sees ~6.6 % of 4-nitrophenol as phenolate at pH 6 with pKa 7.15 (SCIENCE.md §3.2 [derived])', () => {
    // α = 1/(1 + 10^(7.15 − 6)) = 1/(1 + 14.12538) = 0.066114 [derived]
    expect(value(absorbingFraction(6, 7.15))).toBeCloseTo(0.066114, 6);
    const e = value(effectiveExtinction({ value: 18300, unit: 'M-1cm-1' }, 6, 7.15));
    expect(e.value).toBeCloseTo(18300 * 0.066114, 1);
    expect(e.unit).toBe('M-1cm-1');
  });

  it('is one half at pH = pKa and 10/11 one unit above; the acid form is the complement [derived]', () => {
    expect(value(absorbingFraction(7.15, 7.15))).toBeCloseTo(0.5, 14);
    expect(value(absorbingFraction(8.15, 7.15))).toBeCloseTo(10 / 11, 14);
    expect(value(absorbingFraction(6.3, 7.15, 'acid')) + value(absorbingFraction(6.3, 7.15))).toBeCloseTo(
      1,
      14,
    );
  });

  it('corrects a continuous assay: the same slope at pH 6 means 1/α times more product than in base', () => {
    const eff = value(effectiveExtinction({ value: 18.3, unit: 'mM-1cm-1' }, 6, 7.15));
    const atPh6 = value(rateFromAbsorbanceSlope(0.01, { epsilon: eff, pathLengthCm: 0.6, timeUnit: 'min' }));
    const inBase = value(
      rateFromAbsorbanceSlope(0.01, {
        epsilon: { value: 18.3, unit: 'mM-1cm-1' },
        pathLengthCm: 0.6,
        timeUnit: 'min',
      }),
    );
    expect(atPh6.micromolarPerMinute / inBase.micromolarPerMinute).toBeCloseTo(1 / eff.fraction, 10);
  });

  it('refuses non-numbers', () => {
    expect(absorbingFraction(Number.NaN, 7).ok).toBe(false);
    expect(effectiveExtinction({ value: -1, unit: 'M-1cm-1' }, 6, 7).ok).toBe(false);
  });
});

describe('standard curve', () => {
  // Worked by hand: x = 0, 10, 20, 30, 40 µM; y = 0.01, 0.21, 0.39, 0.61, 0.80.
  // x̄ = 20, ȳ = 0.404, Sxx = 1000, Sxy = 19.8 → b = 0.0198, a = 0.404 − 0.0198·20 = 0.008;
  // residuals 0.002, 0.004, −0.014, 0.008, 0 → SSR = 280e-6, s = √(280e-6/3) [derived]
  const standards = [0, 10, 20, 30, 40].map((concentration, i) => ({
    concentration,
    signal: [0.01, 0.21, 0.39, 0.61, 0.8][i],
  }));
  const curve = value(fitStandardCurve(standards));
  const s = Math.sqrt(280e-6 / 3);

  it('fits slope, intercept and residual SD as computed by hand', () => {
    expect(curve.slope).toBeCloseTo(0.0198, 12);
    expect(curve.intercept).toBeCloseTo(0.008, 12);
    expect(curve.residualSd).toBeCloseTo(s, 12);
    expect(curve.slopeSe).toBeCloseTo(s / Math.sqrt(1000), 12);
  });

  it('reads a signal back with the classical inverse-prediction error (Draper & Smith §3.2 [memory])', () => {
    // x0 = (0.5 − 0.008)/0.0198 = 24.848485; s(x0) = (s/b)·√(1 + 1/5 + 0.096²/(0.0198²·1000)) [derived]
    const r = value(concentrationFromSignal(curve, 0.5));
    expect(r.concentration).toBeCloseTo(0.492 / 0.0198, 10);
    expect(r.se!).toBeCloseTo((s / 0.0198) * Math.sqrt(1 + 1 / 5 + 0.096 ** 2 / (0.0198 ** 2 * 1000)), 10);
    expect(r.flags).toEqual([]);
    expect(value(concentrationFromSignal(curve, 1.2)).flags).toEqual(['extrapolated']);
    const triplicate = value(concentrationFromSignal(curve, 0.5, 3));
    expect(triplicate.se!).toBeLessThan(r.se!);
  });

  it('agrees with a Monte Carlo of generated calibrations to within 4 % (a different method)', () => {
    // Generated: true line y = 0.008 + 0.0198x, σ = 0.005, the same five standards, one read at x = 25.
    const noise = seededNormal(99);
    const sigma = 0.005;
    const estimates: number[] = [];
    for (let i = 0; i < 20000; i++) {
      const c = value(
        fitStandardCurve(
          [0, 10, 20, 30, 40].map((x) => ({
            concentration: x,
            signal: 0.008 + 0.0198 * x + sigma * noise(),
          })),
        ),
      );
      const y0 = 0.008 + 0.0198 * 25 + sigma * noise();
      estimates.push((y0 - c.intercept) / c.slope);
    }
    const m = estimates.reduce((a, b) => a + b, 0) / estimates.length;
    const sd = Math.sqrt(estimates.reduce((a, b) => a + (b - m) ** 2, 0) / (estimates.length - 1));
    const formula = (sigma / 0.0198) * Math.sqrt(1 + 1 / 5 + (0.0198 * 5) ** 2 / (0.0198 ** 2 * 1000));
    expect(Math.abs(sd / formula - 1)).toBeLessThan(0.04);
  });

  it('converts a signal slope into a concentration rate, r = slope/b, with the delta-method error', () => {
    const r = value(rateFromSignalSlope(curve, 0.0099, 0.0005));
    expect(r.rate).toBeCloseTo(0.5, 12);
    expect(r.se).toBeCloseTo(Math.hypot(0.0005 / 0.0198, (0.0099 * (s / Math.sqrt(1000))) / 0.0198 ** 2), 12);
  });

  it('needs three standards at two concentrations, and flags a flat calibration', () => {
    expect(fitStandardCurve(standards.slice(0, 2)).ok).toBe(false);
    const same = fitStandardCurve([1, 1, 1].map((c) => ({ concentration: c, signal: c })));
    expect(!same.ok && same.error.code).toBe('degenerate');
    const flat = value(
      fitStandardCurve(
        [0, 1, 2, 3].map((c, i) => ({ concentration: c, signal: [0.1, 0.12, 0.09, 0.11][i] })),
      ),
    );
    expect(flat.flags).toContain('calibration_slope_not_significant');
    expect(value(fitStandardCurve([...standards, { concentration: 50, signal: null }])).flags).toContain(
      'missing_values',
    );
  });
});

describe('specific activity', () => {
  it('10 µM/min in 200 µL with 10 µL of a 0.1 mg/mL preparation is 2 µmol/min/mg [derived]', () => {
    // 10 µmol/L/min × 200e-6 L = 2e-3 µmol/min; 0.1 mg/mL × 0.010 mL = 1e-3 mg
    const r = value(
      specificActivity({
        rateMolarPerSecond: 1e-5 / 60,
        wellVolumeUl: 200,
        enzymeVolumeUl: 10,
        proteinMgPerMl: 0.1,
      }),
    );
    expect(r.micromolesPerMinute).toBeCloseTo(2e-3, 15);
    expect(r.proteinMg).toBeCloseTo(1e-3, 15);
    expect(r.unitsPerMg).toBeCloseTo(2, 12);
    expect(r.se).toBeNull();
  });

  it('divides the protein by the dilution of the enzyme stock and carries the rate error', () => {
    const r = value(
      specificActivity({
        rateMolarPerSecond: 1e-5 / 60,
        rateSe: 1e-6 / 60,
        wellVolumeUl: 200,
        enzymeVolumeUl: 10,
        proteinMgPerMl: 0.1,
        dilutionFactor: 10,
      }),
    );
    expect(r.unitsPerMg).toBeCloseTo(20, 10);
    expect(r.se!).toBeCloseTo(2, 10);
  });

  it('refuses missing or impossible volumes', () => {
    expect(
      specificActivity({ rateMolarPerSecond: 1e-7, wellVolumeUl: 200, enzymeVolumeUl: 0, proteinMgPerMl: 1 })
        .ok,
    ).toBe(false);
    expect(
      specificActivity({ rateMolarPerSecond: 1e-7, wellVolumeUl: 20, enzymeVolumeUl: 30, proteinMgPerMl: 1 })
        .ok,
    ).toBe(false);
    expect(specificActivity(undefined as never).ok).toBe(false);
  });
});
