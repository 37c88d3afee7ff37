import { describe, expect, it } from 'vitest';
import {
  blankDrift,
  blankStats,
  centreByGroup,
  correctForBlanks,
  endpointValues,
  flagOutliers,
  listWells,
  plateTrends,
  replicateStats,
  zPrimeBand,
  zPrimeFactor,
  type PlateResult,
} from '@shared/plate';
import { seededNormal } from './progress-curve';

function value<T>(r: PlateResult<T>): T {
  if (!r.ok) throw new Error(r.error.message);
  return r.value;
}

describe('replicate statistics', () => {
  it('gives mean, sample SD and CV of a hand-worked triplicate', () => {
    // 0.9, 1.0, 1.1: mean 1.0, SD √((0.01 + 0 + 0.01)/2) = 0.1, CV 10 % [derived]
    const r = value(replicateStats([0.9, 1.0, 1.1]));
    expect(r.mean).toBeCloseTo(1, 14);
    expect(r.sd!).toBeCloseTo(0.1, 14);
    expect(r.cvPercent!).toBeCloseTo(10, 12);
    expect(r.flags).toEqual([]);
  });

  it('skips missing values, and says when spread or CV cannot be given', () => {
    expect(value(replicateStats([1, null, 3])).flags).toEqual(['missing_values']);
    const one = value(replicateStats([2, null]));
    expect(one.sd).toBeNull();
    expect(one.flags).toContain('single_replicate');
    const zero = value(replicateStats([-1, 1]));
    expect(zero.cvPercent).toBeNull();
    expect(zero.flags).toContain('cv_undefined');
    expect(replicateStats([null, Number.NaN]).ok).toBe(false);
  });
});

describe('outlier flags: modified z-score |M| > 3.5 (Iglewicz & Hoaglin 1993 [memory])', () => {
  it('flags the far value of a hand-worked set', () => {
    // median 10.1; |deviations| 0.1, 0.1, 0.2, 0, 3.9 → MAD 0.1; M(14.0) = 0.6745·3.9/0.1 = 26.3,
    // M(9.9) = 0.6745·(−0.2)/0.1 = −1.349 [derived]
    const r = value(flagOutliers([10.0, 10.2, 9.9, 10.1, 14.0]));
    expect(r.median).toBeCloseTo(10.1, 12);
    expect(r.mad!).toBeCloseTo(0.1, 12);
    expect(r.scores[4]!).toBeCloseTo(26.3051, 3);
    expect(r.scores[2]!).toBeCloseTo(-1.34898, 4);
    expect(r.outliers).toEqual([false, false, false, false, true]);
  });

  it('in a triplicate, flags the far value only past 5.19 times the near distance [derived: 3.5/0.6745]', () => {
    expect(value(flagOutliers([1.0, 1.1, 1.62])).outliers).toEqual([false, false, true]); // M = 3.507
    expect(value(flagOutliers([1.0, 1.1, 1.6])).outliers).toEqual([false, false, false]); // M = 3.372
  });

  it('keeps scores aligned with the input and says when it cannot judge', () => {
    const r = value(flagOutliers([1, null, 2, 3, 50]));
    expect(r.scores[1]).toBeNull();
    expect(r.outliers[4]).toBe(true);
    expect(value(flagOutliers([1, 2])).flags).toContain('too_few_for_outliers');
    const flat = value(flagOutliers([5, 5, 5, 9]));
    expect(flat.flags).toContain('mad_zero');
    expect(flat.outliers).toEqual([false, false, false, false]);
  });
});

describe('Z′-factor (Zhang, Chung & Oldenburg 1999: Z′ = 1 − 3(σ₊ + σ₋)/|μ₊ − μ₋|)', () => {
  it('computes a hand-worked excellent plate, and its robust form', () => {
    // positives 100, 102, 98, 101, 99: mean 100, SD √(10/4) = 1.581139
    // negatives 10, 11, 9, 10, 10: mean 10, SD √(2/4) = 0.707107
    // Z′ = 1 − 3·2.288246/90 = 0.923725 [derived]
    // robust: medians 100 and 10; MADs 1 and 0 → σ̂ = 1/0.6744898 = 1.482602 and 0;
    // Z′_robust = 1 − 3·1.482602/90 = 0.950580 [derived]
    const r = value(zPrimeFactor([100, 102, 98, 101, 99], [10, 11, 9, 10, 10]));
    expect(r.zPrime!).toBeCloseTo(0.923725, 6);
    expect(r.band).toBe('excellent');
    expect(r.robustZPrime!).toBeCloseTo(0.95058, 5);
    expect(r.positive.sd!).toBeCloseTo(1.581139, 6);
  });

  it('computes a hand-worked marginal plate', () => {
    // positives 50, 60, 40, 55, 45: mean 50, SD √(250/4) = 7.905694; negatives 10, 12, 8, 11, 9: SD 1.581139
    // Z′ = 1 − 3·9.486833/40 = 0.288488 [derived]
    const r = value(zPrimeFactor([50, 60, 40, 55, 45], [10, 12, 8, 11, 9]));
    expect(r.zPrime!).toBeCloseTo(0.288488, 6);
    expect(r.band).toBe('marginal');
  });

  it('bands: 1 ideal, [0.5, 1) excellent, (0, 0.5) marginal, ≤ 0 unusable (SCIENCE.md §3.3; IUPAC)', () => {
    expect(zPrimeBand(1)).toBe('ideal');
    expect(zPrimeBand(0.5)).toBe('excellent');
    expect(zPrimeBand(0.4999)).toBe('marginal');
    expect(zPrimeBand(0)).toBe('unusable');
    expect(value(zPrimeFactor([1, 2, 3], [1.5, 2.5, 3.5])).band).toBe('unusable');
  });

  it('gives null with a flag when it cannot be computed', () => {
    expect(value(zPrimeFactor([1], [0, 0.1])).flags).toContain('too_few_controls');
    const same = value(zPrimeFactor([1, 2], [2, 1]));
    expect(same.zPrime).toBeNull();
    expect(same.flags).toContain('controls_not_separated');
    expect(zPrimeFactor('x' as never, []).ok).toBe(false);
  });
});

describe('blank correction', () => {
  it('subtracts the blank mean of the same pH point and adds SE(blank) in quadrature', () => {
    // blanks 0.10, 0.12, 0.11: mean 0.11, SD 0.01, SE 0.01/√3; sample 0.51 ± 0.02 →
    // 0.40 ± √(0.02² + 0.01²/3) = 0.0208167 [derived]
    const r = value(
      correctForBlanks(
        [
          { id: 'A1', group: 'pH 5.0', value: 0.51, sd: 0.02 },
          { id: 'A2', group: 'pH 6.0', value: 0.3 },
        ],
        [
          { group: 'pH 5.0', value: 0.1 },
          { group: 'pH 5.0', value: 0.12 },
          { group: 'pH 5.0', value: 0.11 },
          { group: 'pH 6.0', value: 0.05 },
        ],
      ),
    );
    expect(r.samples[0].value!).toBeCloseTo(0.4, 12);
    expect(r.samples[0].sd!).toBeCloseTo(0.0208167, 7);
    expect(r.blanks['pH 5.0'].se!).toBeCloseTo(0.01 / Math.sqrt(3), 12);
    expect(r.samples[1].value!).toBeCloseTo(0.25, 12);
    expect(r.samples[1].flags).toContain('single_blank');
  });

  it('refuses a pH point without a blank', () => {
    const r = correctForBlanks([{ id: 'A1', group: 'pH 7', value: 1 }], [{ group: 'pH 5', value: 0.1 }]);
    expect(!r.ok && r.error.code).toBe('no_blank');
    expect(blankStats([null]).ok).toBe(false);
  });
});

describe('end-point values', () => {
  it('keeps values, and nulls missing or saturated wells with a flag', () => {
    const r = value(endpointValues({ A1: 0.5, A2: null, A3: 3.1, A4: 'x' }));
    expect(r.A1).toEqual({ value: 0.5, flags: [] });
    expect(r.A2.flags).toEqual(['missing_values']);
    expect(r.A3).toEqual({ value: null, flags: ['above_linear_range'] });
    expect(value(endpointValues({ A3: 3.1 }, { linearRangeMax: null })).A3.value).toBe(3.1);
  });
});

/** A generated 96-well plate: 1.0 + N(0, 0.02) per well, plus an optional artefact. */
function generatedPlate(
  seed: number,
  artefact: (row: number, column: number, edge: boolean) => number = () => 0,
) {
  const noise = seededNormal(seed);
  const values: Record<string, number> = {};
  for (const w of listWells(96)) {
    const edge = w.row === 0 || w.row === 7 || w.column === 0 || w.column === 11;
    values[w.name] = 1 + 0.02 * noise() + artefact(w.row, w.column, edge);
  }
  return values;
}

describe('plate trends (generated plates)', () => {
  it('raises a false alarm on about 3 % of uniform plates (three tests at α = 0.01 each)', () => {
    let flagged = 0;
    for (let seed = 1; seed <= 500; seed++)
      if (value(plateTrends(generatedPlate(seed), 96)).flags.length > 0) flagged++;
    expect(flagged / 500).toBeGreaterThan(0.005);
    expect(flagged / 500).toBeLessThan(0.05);
  });

  it('flags a column gradient of 0.01 per column and reports its size', () => {
    const r = value(
      plateTrends(
        generatedPlate(4, (_r, c) => 0.01 * c),
        96,
      ),
    );
    expect(r.flags).toContain('column_trend');
    expect(r.column!.changeAcrossPlate).toBeCloseTo(0.11, 1);
  });

  it('flags outer-ring wells that read 5 % high (evaporation)', () => {
    const r = value(
      plateTrends(
        generatedPlate(5, (_r, _c, edge) => (edge ? 0.05 : 0)),
        96,
      ),
    );
    expect(r.flags).toContain('edge_effect');
    expect(r.edge!.difference).toBeCloseTo(0.05, 1);
  });

  it('can demand a minimum effect size, and centres groups before testing', () => {
    const r = value(
      plateTrends(
        generatedPlate(4, (_r, c) => 0.01 * c),
        96,
        { minEffect: 0.5 },
      ),
    );
    expect(r.flags).not.toContain('column_trend');
    const centred = centreByGroup({ A1: 1, A2: 3, B1: 10, B2: null }, { A1: 'x', A2: 'x', B1: 'y', B2: 'y' });
    expect(centred).toEqual({ A1: -1, A2: 1, B1: 0, B2: null });
  });

  it('refuses well names that are not on the plate, and says when too few wells', () => {
    expect(plateTrends({ Z9: 1 }, 96).ok).toBe(false);
    expect(value(plateTrends({ A1: 1, B2: 2 }, 96)).flags).toContain('too_few_wells');
  });
});

describe('blank drift across pH (slope of blank against pH, t test at 5 %)', () => {
  const pH = [3, 3, 4, 4, 5, 5, 6, 6, 7, 7, 8, 8];
  it('flags blanks that rise by 0.01 per pH unit (generated, noise 0.003)', () => {
    const noise = seededNormal(21);
    const r = value(blankDrift(pH.map((p) => ({ pH: p, value: 0.05 + 0.01 * p + 0.003 * noise() }))));
    expect(r.flags).toContain('blank_drift');
    expect(r.slope!).toBeCloseTo(0.01, 2);
    expect(r.changeAcrossRange!).toBeCloseTo(0.05, 1);
  });

  it('does not flag flat blanks (generated, same noise)', () => {
    const noise = seededNormal(21);
    const r = value(blankDrift(pH.map((p) => ({ pH: p, value: 0.05 + 0.003 * noise() }))));
    expect(r.flags).not.toContain('blank_drift');
    expect(r.p!).toBeGreaterThan(0.05);
  });

  it('needs three blanks at two pH values', () => {
    expect(
      value(
        blankDrift([
          { pH: 5, value: 0.1 },
          { pH: 6, value: 0.2 },
        ]),
      ).flags,
    ).toContain('too_few_points');
    expect(blankDrift([{ pH: Number.NaN, value: 0.1 }]).ok).toBe(false);
  });
});
