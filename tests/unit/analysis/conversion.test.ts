// From signal to product and activity: end points with a standard curve (GENERATED study, invented
// data, make-study.ts), Beer–Lambert with and without an indicator's pH dependence, and hand-made
// plates whose numbers are worked out beside each check.
import { describe, expect, it } from 'vitest';
import { analyseStudy, type AnalysisInput, type AnalysisResult } from '../../../shared/analysis';
import { makeStudy } from '../../fixtures/analysis/make-study';
import { endpointStudy, row, series } from './helpers';

function run(input: AnalysisInput): AnalysisResult {
  const r = analyseStudy(input);
  if (!r.ok) throw new Error(r.error.message);
  return r.value;
}

describe('an end-point study with a standard curve (generated, fluorescence)', () => {
  const study = makeStudy({
    seed: 21,
    readMode: 'endpoint',
    quantitation: 'standard-curve',
    detection: 'fluorescence',
    readNoise: 2,
  });
  const result = run(study.input);
  const samples = result.wells.filter((w) => w.role === 'sample');

  it('reads the standard curve back: slope 12 RFU/µM, intercept 150 RFU (the generator’s)', () => {
    const curve = result.standardCurves.find((c) => c.scope === 'plate')!;
    expect(curve.n).toBe(14); // 7 levels × 2 (make-study.ts)
    expect(curve.slope).toBeCloseTo(12, 1);
    expect(curve.intercept).toBeGreaterThan(145);
    expect(curve.intercept).toBeLessThan(155);
  });

  it('gives product concentrations within 1 µM of the truth', () => {
    // Truth: enzyme-made product at the 10-min read (make-study.ts). Read noise 2 RFU ÷ 12 RFU/µM ≈ 0.17 µM per well,
    // plus the blank mean's and the slope's share: 1 µM is ≈ 5 SD.
    for (const w of samples) {
      const truth = study.truth[`${w.plateId}:${w.well}`].productUm!;
      expect(Math.abs(w.rate! - truth)).toBeLessThan(1);
      // a single read has no error of its own: none is claimed (blanks.ts)
      expect(w.rateSe).toBeNull();
    }
  });

  it('says the unit is product, not a rate, without a reaction time', () => {
    expect(result.units).toMatchObject({
      signal: 'RFU',
      rate: 'µM',
      activity: 'µM',
      activityKind: 'product',
    });
    expect(result.units.note).toMatch(/reaction time/);
  });

  it('divides by the reaction time when it is given, and then gives specific activity', () => {
    const timed = run({ ...study.input, settings: { ...study.input.settings, reactionTimeMin: 10 } });
    expect(timed.units).toMatchObject({ rate: 'µM/min', activityKind: 'specific' });
    for (const w of timed.wells.filter((x) => x.role === 'sample').slice(0, 20)) {
      const before = row(result, w.plateId, w.well);
      expect(w.rate!).toBeCloseTo(before.rate! / 10, 10);
    }
  });
});

describe('a kinetic study with a standard curve (generated, fluorescence)', () => {
  it('divides the rate of signal change by the curve’s slope and finds the true rates', () => {
    const study = makeStudy({
      seed: 31,
      quantitation: 'standard-curve',
      detection: 'fluorescence',
      readNoise: 2,
    });
    const result = run(study.input);
    expect(result.units).toMatchObject({ signal: 'RFU/min', rate: 'µM/min', activityKind: 'specific' });
    const curve = result.standardCurves.find((c) => c.scope === 'plate')!;
    for (const w of result.wells.filter((x) => x.role === 'sample')) {
      expect(w.rate!).toBeCloseTo(w.corrected! / curve.slope, 10); // r = slope/b (shared/plate standard-curve.ts)
      const truth = study.truth[`${w.plateId}:${w.well}`].v0;
      if (truth > 5 && w.n! >= 30) expect(Math.abs(w.rate! - truth) / truth).toBeLessThan(0.02);
    }
  });
});

describe('Beer–Lambert with an indicator product (generated kinetic study, chromophore pKa 7.15)', () => {
  // 4-nitrophenol pKa ≈ 7.15 at 25 °C [pub, STEEP ref "c"; SCIENCE.md §3.2]; only the phenolate absorbs.
  const study = makeStudy({ seed: 8, chromophorePka: 7.15, readNoise: 0.001 });
  const result = run(study.input);

  it('divides by ε·α(pH)·l: α = 1/(1 + 10^(pKa − pH)) at each well’s pH', () => {
    for (const w of result.wells.filter((x) => x.role === 'sample').slice(0, 60)) {
      const alpha = 1 / (1 + 10 ** (7.15 - w.pH!));
      expect(w.rate!).toBeCloseTo((w.corrected! / (6220 * alpha * 0.5)) * 1e6, 8);
    }
  });

  it('recovers the true rates where the product is visible, and flags pH points where < 10 % of it absorbs', () => {
    // α(6.0) = 0.066 (SCIENCE.md §3.2: ~6.6 % at pH 6) → flagged; α(7.0) = 0.41 → not flagged [derived]
    const at = (pH: number) => result.wells.filter((w) => w.role === 'sample' && w.pH === pH);
    expect(at(6).every((w) => w.flags.includes('low_absorbing_fraction'))).toBe(true);
    expect(at(7).some((w) => w.flags.includes('low_absorbing_fraction'))).toBe(false);
    for (const w of [...at(7), ...at(7.5), ...at(8)]) {
      const truth = study.truth[`${w.plateId}:${w.well}`].v0;
      if (truth > 5 && w.n! >= 30) expect(Math.abs(w.rate! - truth) / truth).toBeLessThan(0.03);
    }
  });
});

describe('hand-made end-point plates (ε = 10 000 M⁻¹cm⁻¹, l = 1 cm)', () => {
  const wells = {
    ...series({ row: 'A', column: 1 }, { role: 'sample', variantId: 'ref', pH: 6 }, [0.5, 0.5]),
    ...series({ row: 'B', column: 1 }, { role: 'blank', pH: 6 }, [0.1, 0.1]),
    ...series({ row: 'C', column: 1 }, { role: 'sample', variantId: 'ref', pH: 7 }, [0.9, 0.9]),
    ...series({ row: 'D', column: 1 }, { role: 'blank', pH: 7 }, [0.1, 0.1]),
  };

  it('stopped with base: the full ε; c = (0.5 − 0.1)/(10 000·1) M = 40 µM', () => {
    const result = run(endpointStudy(wells));
    expect(row(result, 'p1', 'A1').rate!).toBeCloseTo(40, 10);
    expect(row(result, 'p1', 'C1').rate!).toBeCloseTo(80, 10);
  });

  it('read at the assay pH (no stop solution) with chromophore pKa 7: ε·α, α(6) = 1/11, α(7) = 1/2', () => {
    const input = endpointStudy(wells);
    input.assay = { ...input.assay, stopSolution: '', chromophorePka: 7 };
    const result = run(input);
    expect(row(result, 'p1', 'A1').rate!).toBeCloseTo(40 * 11, 8); // 440 µM [derived]
    expect(row(result, 'p1', 'C1').rate!).toBeCloseTo(80 * 2, 8); // 160 µM [derived]
  });

  it('takes ε in mM⁻¹cm⁻¹ as 1000 times larger', () => {
    const input = endpointStudy(wells);
    input.assay = { ...input.assay, extinctionCoefficient: 10, extinctionUnit: 'mM-1cm-1' };
    expect(row(run(input), 'p1', 'A1').rate!).toBeCloseTo(40, 10);
  });

  it('reads product off the plate’s standard curve: (0.7 − 0.1)/0.02 per µM = 30 µM', () => {
    // Standards on an exact line signal = 0.1 + 0.02·c (invented): the intercept cancels against the blank.
    const input = endpointStudy({
      A1: { role: 'sample', variantId: 'ref', pH: 6, value: 0.7 },
      A2: { role: 'sample', variantId: 'ref', pH: 6, value: 0.7 },
      B1: { role: 'blank', pH: 6, value: 0.1 },
      B2: { role: 'blank', pH: 6, value: 0.1 },
      C1: { role: 'standard', concentrationUm: 0, value: 0.1 },
      C2: { role: 'standard', concentrationUm: 10, value: 0.3 },
      C3: { role: 'standard', concentrationUm: 20, value: 0.5 },
      C4: { role: 'standard', concentrationUm: 40, value: 0.9 },
    });
    input.assay = {
      ...input.assay,
      quantitation: 'standard-curve',
      extinctionCoefficient: null,
      pathLengthCm: null,
    };
    const result = run(input);
    expect(row(result, 'p1', 'A1').rate!).toBeCloseTo(30, 8);
    expect(result.standardCurves[0]).toMatchObject({ scope: 'plate', n: 4 });
    expect(result.standardCurves[0].slope).toBeCloseTo(0.02, 12);
  });

  it('leaves an excluded standard out of the curve', () => {
    // A fifth standard read wrong (invented): with it the line is off; excluded, the exact line returns.
    const input = endpointStudy({
      A1: { role: 'sample', variantId: 'ref', pH: 6, value: 0.7 },
      B1: { role: 'blank', pH: 6, value: 0.1 },
      C1: { role: 'standard', concentrationUm: 0, value: 0.1 },
      C2: { role: 'standard', concentrationUm: 10, value: 0.3 },
      C3: { role: 'standard', concentrationUm: 20, value: 0.5 },
      C4: { role: 'standard', concentrationUm: 40, value: 0.9 },
      C5: { role: 'standard', concentrationUm: 30, value: 2.0 },
    });
    input.assay = {
      ...input.assay,
      quantitation: 'standard-curve',
      extinctionCoefficient: null,
      pathLengthCm: null,
    };
    expect(row(run(input), 'p1', 'A1').rate!).not.toBeCloseTo(30, 1);
    input.exclusions = [{ id: 's5', plateId: 'p1', well: 'C5', reason: 'Standard pipetted twice' }];
    const result = run(input);
    expect(row(result, 'p1', 'A1').rate!).toBeCloseTo(30, 8);
    expect(result.standardCurves[0].wells).toEqual(['C1', 'C2', 'C3', 'C4']);
  });

  it('keeps signal units in every column when nothing converts to product (no path length)', () => {
    const input = endpointStudy(wells);
    input.assay = { ...input.assay, pathLengthCm: null };
    const result = run(input);
    expect(result.units).toMatchObject({ signal: 'A', rate: 'A', activity: 'A', activityKind: 'signal' });
    expect(row(result, 'p1', 'A1')).toMatchObject({ corrected: 0.4, rate: 0.4, activity: 0.4 });
  });

  it('borrows the standards of the other plates for a plate without any, and says so', () => {
    const input = endpointStudy({
      A1: { role: 'sample', variantId: 'ref', pH: 6, value: 0.7 },
      B1: { role: 'blank', pH: 6, value: 0.1 },
      C1: { role: 'standard', concentrationUm: 0, value: 0.1 },
      C2: { role: 'standard', concentrationUm: 10, value: 0.3 },
      C3: { role: 'standard', concentrationUm: 20, value: 0.5 },
    });
    input.assay = {
      ...input.assay,
      quantitation: 'standard-curve',
      extinctionCoefficient: null,
      pathLengthCm: null,
    };
    const second = structuredClone(input.plates[0]);
    second.id = 'p2';
    second.name = 'Plate 2';
    for (const w of ['C1', 'C2', 'C3']) {
      delete second.map.wells[w];
      delete second.read!.wells[w];
    }
    input.plates.push(second);
    const result = run(input);
    expect(row(result, 'p2', 'A1').rate!).toBeCloseTo(30, 8);
    expect(row(result, 'p2', 'A1').flags).toContain('standard_curve_other_plates');
    expect(row(result, 'p1', 'A1').flags).not.toContain('standard_curve_other_plates');
  });
});
