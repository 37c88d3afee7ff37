// Bootstrap intervals for every profile of a GENERATED study (make-study.ts, invented data), with progress.
import { describe, expect, it } from 'vitest';
import {
  analyseStudy,
  bootstrapProfile,
  bootstrapProfiles,
  type AnalysisResult,
} from '../../../shared/analysis';
import { DEFAULT_VARIANTS, makeStudy } from '../../fixtures/analysis/make-study';
import { nonFinite } from './helpers';

const study = makeStudy({ seed: 13, variants: DEFAULT_VARIANTS.slice(0, 3) });
const analysed = analyseStudy(study.input);
if (!analysed.ok) throw new Error(analysed.error.message);
const result: AnalysisResult = analysed.value;

describe('bootstrapProfiles', () => {
  const progress: [number, number][] = [];
  const booted = bootstrapProfiles(result, study.input, {
    resamples: 200,
    seed: 3,
    onProgress: (d, t) => progress.push([d, t]),
  });
  if (!booted.ok) throw new Error(booted.error.message);
  const out = booted.value;

  it('adds percentile intervals of the optimum and the window to every fitted profile', () => {
    for (const p of out.profiles) {
      expect(p.bootstrap).toMatchObject({ resamples: 200, seed: 3 + out.profiles.indexOf(p) });
      const [lo, hi] = p.fit!.pHopt.boot95!;
      expect(lo!).toBeLessThan(p.fit!.pHopt.value!);
      expect(hi!).toBeGreaterThan(p.fit!.pHopt.value!);
      expect(p.fit!.window.width.boot95).not.toBeNull();
      expect(p.fit!.parameters.pKa1.boot95).not.toBeNull();
    }
    // The optimum of a bell is (pKa1 + pKa2)/2 (SCIENCE.md §1.2): truth for FR1-WT is 6.0 (make-study.ts).
    const wt = out.profiles.find((p) => p.variantId === 'v-wt')!.fit!.pHopt.boot95!;
    expect(wt[0]! < 6.0 + 0.05 && wt[1]! > 6.0 - 0.05).toBe(true);
    expect(nonFinite(out)).toEqual([]);
  });

  it('reports progress from 0 to the total, after each profile', () => {
    expect(progress[0]).toEqual([0, 600]);
    expect(progress.at(-1)).toEqual([600, 600]);
    expect(progress.map(([d]) => d)).toEqual([0, 200, 400, 600]);
  });

  it('leaves the result it was given unchanged, and gives the same intervals for the same seed', () => {
    expect(result.profiles[0].fit!.pHopt.boot95).toBeNull();
    const again = bootstrapProfiles(result, study.input, { resamples: 200, seed: 3 });
    expect(again.ok && again.value.profiles[1].fit!.pHopt.boot95).toEqual(out.profiles[1].fit!.pHopt.boot95);
  });

  it('refuses a result made before an exclusion changed, and bad options', () => {
    const changed = {
      ...study.input,
      exclusions: [{ id: 'x', plateId: 'plate-1', well: 'A1', reason: 'Bubble' }],
    };
    const stale = bootstrapProfiles(result, changed, { resamples: 10 });
    expect(stale.ok).toBe(false);
    if (!stale.ok)
      expect(stale.error).toMatchObject({ code: 'stale_result', message: expect.stringMatching(/excluded/) });
    const bad = bootstrapProfiles(result, study.input, { resamples: 0 });
    expect(!bad.ok && bad.error.code).toBe('invalid_setting');
  });

  it('bootstrapProfile does one profile; seed + i reproduces bootstrapProfiles', () => {
    const one = bootstrapProfile(result.profiles[2], { resamples: 200, seed: 3 + 2 });
    if (!one.ok) throw new Error(one.error.message);
    expect(one.value.fit!.window.width.boot95).toEqual(out.profiles[2].fit!.window.width.boot95);
    expect(one.value.bootstrap).toEqual(out.profiles[2].bootstrap);
    expect(result.profiles[2].bootstrap).toBeNull();
    const unfitted = bootstrapProfile({ ...result.profiles[0], fit: null });
    expect(!unfitted.ok && unfitted.error.message).toMatch(/no fit/);
  });
});
