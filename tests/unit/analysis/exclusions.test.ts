// Exclusions on a GENERATED study (tests/fixtures/analysis/make-study.ts, invented data): a well, a
// whole point, a blank; each excluded well keeps its reason; the fit changes.
import { describe, expect, it } from 'vitest';
import {
  analyseStudy,
  type AnalysisInput,
  type AnalysisResult,
  type ExclusionInput,
} from '../../../shared/analysis';
import { makeStudy } from '../../fixtures/analysis/make-study';
import { row } from './helpers';

function run(input: AnalysisInput): AnalysisResult {
  const r = analyseStudy(input);
  if (!r.ok) throw new Error(r.error.message);
  return r.value;
}

const study = makeStudy({ seed: 3 });
const base = run(study.input);
const wt = () => base.profiles.find((p) => p.variantId === 'v-wt')!;
const wellsAt = (result: AnalysisResult, variantId: string, pH: number, role = 'sample') =>
  result.wells.filter(
    (w) => w.role === role && w.variantId === (role === 'sample' ? variantId : null) && w.pH === pH,
  );

function withExclusions(exclusions: ExclusionInput[]): AnalysisInput {
  return { ...study.input, exclusions };
}

describe('excluding wells', () => {
  it('takes one well out of the fit, keeps its row and its reason, and changes the fit', () => {
    const target = wellsAt(base, 'v-wt', 7.5)[0];
    const reason = 'Bubble seen in the well (generated example)';
    const result = run(withExclusions([{ id: 'x1', plateId: target.plateId, well: target.well, reason }]));
    const r = row(result, target.plateId, target.well);
    expect(r).toMatchObject({ excluded: true, exclusion: { id: 'x1', reason } });
    expect(r.activity).toBe(target.activity); // still computed and shown
    const profile = result.profiles.find((p) => p.variantId === 'v-wt')!;
    const point = profile.points.find((p) => p.pH === 7.5)!;
    expect(point.n).toBe(3);
    expect(point.excluded).toEqual([
      { plateId: target.plateId, well: target.well, exclusionId: 'x1', reason },
    ]);
    expect(point.wells.map((w) => w.well)).not.toContain(target.well);
    expect(profile.fitData.wells.map((w) => w.well)).not.toContain(target.well);
    expect(profile.fit!.n).toBe(wt().fit!.n - 1);
    expect(profile.fit!.parameters.pKa2.value).not.toBe(wt().fit!.parameters.pKa2.value);
    expect(profile.fit!.ssr).not.toBe(wt().fit!.ssr);
  });

  it('excludes a whole point as one exclusion per well, each with its reason', () => {
    const targets = wellsAt(base, 'v-wt', 5);
    const exclusions = targets.map((t, i) => ({
      id: `p${i}`,
      plateId: t.plateId,
      well: t.well,
      reason: 'pH meter drifted at this point',
    }));
    const result = run(withExclusions(exclusions));
    const profile = result.profiles.find((p) => p.variantId === 'v-wt')!;
    const point = profile.points.find((p) => p.pH === 5)!;
    expect(point).toMatchObject({ n: 0, mean: null, sd: null });
    expect(point.excluded).toHaveLength(4);
    expect(point.excluded.every((e) => e.reason === 'pH meter drifted at this point')).toBe(true);
    expect(profile.fit!.n).toBe(wt().fit!.n - 4);
    expect(profile.fitData.pH).not.toContain(5);
  });

  it('leaves an excluded blank out of the blank mean', () => {
    const blanks = wellsAt(base, '', 6, 'blank');
    const result = run(
      withExclusions([
        { id: 'b1', plateId: blanks[0].plateId, well: blanks[0].well, reason: 'Drop of enzyme splashed in' },
      ]),
    );
    const kept = blanks.slice(1);
    const mean = kept.reduce((s, b) => s + b.signal!, 0) / kept.length;
    const sample = wellsAt(result, 'v-wt', 6)[0];
    expect(sample.blank!.n).toBe(3);
    expect(sample.blank!.mean).toBeCloseTo(mean, 12);
    expect(row(result, blanks[0].plateId, blanks[0].well).exclusion!.reason).toBe(
      'Drop of enzyme splashed in',
    );
  });

  it('flags a spoiled well as an outlier, and the flag stays when a person excludes it', () => {
    const input = structuredClone(study.input);
    const target = wellsAt(base, 'v-wt', 6.5)[1];
    const trace = input.plates[0].read!.wells[target.well];
    trace.values = trace.values!.map((v, k) => v! + 0.003 * k); // generated spoilage: +0.018 A/min
    const flagged = run(input);
    expect(row(flagged, target.plateId, target.well)).toMatchObject({ outlier: true });
    expect(row(flagged, target.plateId, target.well).flags).toContain('outlier');
    expect(flagged.qc.plates[0].outliers.map((o) => o.well)).toContain(target.well);
    input.exclusions = [
      { id: 'o1', plateId: target.plateId, well: target.well, reason: 'Outlier: trace rises too fast' },
    ];
    const excluded = run(input);
    expect(row(excluded, target.plateId, target.well)).toMatchObject({ outlier: true, excluded: true });
    const before = flagged.profiles.find((p) => p.variantId === 'v-wt')!.fit!;
    const after = excluded.profiles.find((p) => p.variantId === 'v-wt')!.fit!;
    expect(after.s2!).toBeLessThan(before.s2!);
  });

  it('refuses an exclusion without a reason, and notes one for a well that is not mapped', () => {
    const t = wellsAt(base, 'v-wt', 7)[0];
    const noReason = analyseStudy(
      withExclusions([{ id: 'e', plateId: t.plateId, well: t.well, reason: '  ' }]),
    );
    expect(noReason.ok).toBe(false);
    if (!noReason.ok)
      expect(noReason.error).toMatchObject({
        code: 'invalid_input',
        message: expect.stringMatching(/reason/),
      });
    const stray = run(withExclusions([{ id: 'e', plateId: t.plateId, well: 'P24', reason: 'typo' }]));
    expect(stray.notes.map((n) => n.code)).toContain('unknown_exclusion');
    expect(stray.wells.some((w) => w.excluded)).toBe(false);
  });

  it('accepts the well name as A01 as well as A1', () => {
    const result = run(
      withExclusions([{ id: 'e', plateId: 'plate-1', well: 'A01', reason: 'Scratched well' }]),
    );
    expect(row(result, 'plate-1', 'A1')).toMatchObject({
      excluded: true,
      exclusion: { reason: 'Scratched well' },
    });
  });
});
