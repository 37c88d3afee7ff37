// Plate QC: Z′ on a hand-made plate worked out beside the checks; overlap points, blank drift and
// plate trends on GENERATED studies (tests/fixtures/analysis/make-study.ts, invented data).
import { describe, expect, it } from 'vitest';
import {
  analyseStudy,
  type AnalysisInput,
  type AnalysisResult,
  Z_PRIME_RULE,
} from '../../../shared/analysis';
import { DEFAULT_POINTS, DEFAULT_VARIANTS, makeStudy } from '../../fixtures/analysis/make-study';
import { endpointStudy, series } from './helpers';

function run(input: AnalysisInput): AnalysisResult {
  const r = analyseStudy(input);
  if (!r.ok) throw new Error(r.error.message);
  return r.value;
}

// Hand-made end-point plate (invented numbers). The reference variant is most active at pH 6.
const zWells = {
  ...series({ row: 'A', column: 1 }, { role: 'sample', variantId: 'ref', pH: 6 }, [1.0, 1.1, 0.9, 1.0]),
  ...series({ row: 'B', column: 1 }, { role: 'blank', pH: 6 }, [0.1, 0.12, 0.08, 0.1]),
  ...series({ row: 'C', column: 1 }, { role: 'sample', variantId: 'ref', pH: 5 }, [0.5, 0.55, 0.45, 0.5]),
  ...series({ row: 'D', column: 1 }, { role: 'blank', pH: 5 }, [0.1, 0.1, 0.11, 0.09]),
  ...series({ row: 'E', column: 1 }, { role: 'sample', variantId: 'other', pH: 6 }, [2.0, 2.6, 1.4, 2.2]),
};

describe('Z′ of a plate', () => {
  it('uses the reference variant at its most active pH and the blanks there: Z′ = 0.67340, robust 0.70348', () => {
    // Zhang, Chung & Oldenburg 1999 (SCIENCE.md §3.3): Z′ = 1 − 3(σ₊ + σ₋)/|μ₊ − μ₋|.
    // By hand [derived]: μ₊ = 1.0, σ₊ = 0.081650; μ₋ = 0.10, σ₋ = 0.016330 → 1 − 3·0.097980/0.9 = 0.673401.
    // Robust (medians, MAD/0.674490): 1 − 3·(0.05 + 0.01)/0.674490/0.9 = 0.703480.
    const z = run(endpointStudy(zWells)).qc.plates[0].zPrime;
    expect(z.zPrime!).toBeCloseTo(0.6734014, 6);
    expect(z.robustZPrime!).toBeCloseTo(0.7034796, 6);
    expect(z.band).toBe('excellent'); // 1 > Z′ ≥ 0.5 (IUPAC Gold Book, SCIENCE.md §3.3)
    expect(z.positive).toMatchObject({ variantId: 'ref', pH: 6, wells: ['A1', 'A2', 'A3', 'A4'] });
    expect(z.negative).toMatchObject({ pH: 6, wells: ['B1', 'B2', 'B3', 'B4'] });
    expect(z.rule).toBe(Z_PRIME_RULE);
    expect(z.flags).toEqual([]);
  });

  it("falls back to the plate's most active variant when the reference is not on the plate, and says so", () => {
    const wells = Object.fromEntries(Object.entries(zWells).filter(([w]) => !/^[AC]/.test(w)));
    const z = run(endpointStudy(wells)).qc.plates[0].zPrime;
    expect(z.positive).toMatchObject({ variantId: 'other', pH: 6 });
    expect(z.flags).toContain('reference_not_on_plate');
  });

  it('gives no Z′ without blanks, with a flag', () => {
    const wells = Object.fromEntries(Object.entries(zWells).filter(([w]) => !/^[BD]/.test(w)));
    const z = run(endpointStudy(wells)).qc.plates[0].zPrime;
    expect(z.zPrime).toBeNull();
    expect(z.flags).toContain('no_controls');
  });
});

describe('replicate CVs and plate-map checks', () => {
  it('flags a point whose CV is over 20 % and not one at 10 %', () => {
    // Blank-corrected values 0.9, 1.4, 0.4 → mean 0.9, SD 0.5, CV 55.6 %; the pH 6 point above: CV 10.9 % [derived]
    const others = Object.fromEntries(Object.entries(zWells).filter(([w]) => !w.startsWith('C')));
    const wells = {
      ...others,
      ...series({ row: 'C', column: 1 }, { role: 'sample', variantId: 'ref', pH: 5 }, [1.0, 1.5, 0.5]),
    };
    const cvs = run(endpointStudy(wells)).qc.plates[0].replicateCvs;
    const at = (pH: number) => cvs.find((c) => c.variantId === 'ref' && c.pH === pH)!;
    expect(at(5).cvPercent!).toBeCloseTo(55.5556, 3);
    expect(at(5).overLimit).toBe(true);
    expect(at(6).cvPercent!).toBeCloseTo((0.0816497 / 0.9) * 100, 3);
    expect(at(6).overLimit).toBe(false);
  });

  it('reports the map checks and leaves samples without a blank unconverted', () => {
    const wells = Object.fromEntries(Object.entries(zWells).filter(([w]) => !w.startsWith('D')));
    const result = run(endpointStudy(wells));
    expect(result.qc.plates[0].mapChecks.find((c) => c.code === 'missing_blank')!.wells).toEqual([
      'C1',
      'C2',
      'C3',
      'C4',
    ]);
    const point = result.profiles.find((p) => p.variantId === 'ref')!.points.find((p) => p.pH === 5)!;
    expect(point.n).toBe(0);
    expect(point.missing).toHaveLength(4);
    expect(result.wells.find((w) => w.well === 'C1')!.flags).toContain('no_blank');
  });
});

describe('overlap points (same variant and pH in two buffers)', () => {
  const points = [...DEFAULT_POINTS, { pH: 5.5, buffer: 'mes' }];
  const overlapsOf = (result: AnalysisResult) => result.qc.overlaps;

  it('detects a generated buffer-specific effect (+10 % in MES for FR1-WT) at α = 0.05', () => {
    for (const seed of [1, 2, 3]) {
      const study = makeStudy({
        seed,
        points,
        bufferEffect: { variantId: 'v-wt', buffer: 'mes', factor: 1.1 },
      });
      const result = run(study.input);
      const wt = overlapsOf(result).find((o) => o.variantId === 'v-wt')!;
      expect(wt).toMatchObject({
        pH: 5.5,
        buffers: ['acetate', 'mes'],
        ns: [4, 4],
        flagged: true,
        samePlate: true,
      });
      expect(wt.means[1]).toBeGreaterThan(wt.means[0]);
      expect(result.qc.plates[0].flags).toContain('buffer_effect');
      expect(result.flagText.buffer_effect).toMatch(/buffer-specific/);
    }
  });

  it('does not flag overlap points without an effect (beyond the 5 % expected by chance)', () => {
    // 10 seeds × 4 variants = 40 tests without an effect. Binomial(40, 0.05): mean 2, P(≥ 7) ≈ 0.005 [derived].
    let flagged = 0;
    let tests = 0;
    for (let seed = 1; seed <= 10; seed++) {
      const result = run(makeStudy({ seed, points }).input);
      tests += overlapsOf(result).length;
      flagged += overlapsOf(result).filter((o) => o.flagged).length;
    }
    expect(tests).toBe(40);
    expect(flagged).toBeLessThan(7);
  });
});

describe('blank drift and plate trends', () => {
  it('flags blanks that drift with pH (generated: +0.1 µM/min per pH unit) and not steady ones', () => {
    const drifting = run(makeStudy({ seed: 4 }).input).qc.plates[0];
    expect(drifting.blankDrift!.flags).toContain('blank_drift');
    expect(drifting.flags).toContain('blank_drift');
    // slope in A/min per pH = 0.1 µM/min·ε·l = 0.1·6220·0.5·1e-6 = 3.11e-4 [derived from make-study.ts]
    expect(drifting.blankDrift!.slope!).toBeCloseTo(3.11e-4, 4);
    const steady = run(makeStudy({ seed: 4, blankRate: () => 0.3 }).input).qc.plates[0];
    expect(steady.blankDrift!.flags).not.toContain('blank_drift');
  });

  it('finds a column gradient on a generated uniformity plate (one variant, one pH, 300 wells)', () => {
    // A uniformity plate shows position effects at full power; on a study plate the design absorbs part (qc.ts).
    const uniform = {
      seed: 6,
      points: [{ pH: 6, buffer: 'mes' }],
      variants: [DEFAULT_VARIANTS[0]],
      replicates: 300,
    };
    const clean = run(makeStudy(uniform).input).qc.plates[0];
    expect(clean.trends!.n).toBe(300);
    expect(clean.trends!.flags).toEqual([]);
    const study = makeStudy(uniform);
    const read = study.input.plates[0].read!;
    for (const [well, a] of Object.entries(study.input.plates[0].map.wells)) {
      if (a.role !== 'sample') continue;
      const column = Number(well.slice(1));
      const t0 = read.wells[well].values![0]!;
      // generated artefact: traces steepen by 0.5 % per column (evaporation-like), around their start
      read.wells[well].values = read.wells[well].values!.map((v) => t0 + (v! - t0) * (1 + 0.005 * column));
    }
    const tilted = run(study.input).qc.plates[0];
    expect(tilted.trends!.flags).toContain('column_trend');
    expect(tilted.trends!.flags).not.toContain('row_trend');
    expect(tilted.flags).toContain('column_trend');
  });
});
