// Bad input never throws: typed errors for what cannot be analysed, flagged nulls for poor data.
// Studies are hand-made (helpers.ts) or GENERATED (make-study.ts), all invented.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { analyseStudy, type AnalysisInput, type AnalysisResult } from '../../../shared/analysis';
import { DEFAULT_VARIANTS, makeStudy } from '../../fixtures/analysis/make-study';
import { endpointStudy, nonFinite, row, series } from './helpers';

function errorOf(input: unknown) {
  const r = analyseStudy(input as AnalysisInput);
  if (r.ok) throw new Error('expected an error');
  return r.error;
}

function run(input: AnalysisInput): AnalysisResult {
  const r = analyseStudy(input);
  if (!r.ok) throw new Error(r.error.message);
  expect(nonFinite(r.value)).toEqual([]);
  return r.value;
}

const good = () =>
  endpointStudy({
    ...series({ row: 'A', column: 1 }, { role: 'sample', variantId: 'ref', pH: 5 }, [0.5, 0.6, 0.55]),
    ...series({ row: 'B', column: 1 }, { role: 'sample', variantId: 'ref', pH: 6 }, [0.9, 1.0, 0.95]),
    ...series({ row: 'C', column: 1 }, { role: 'sample', variantId: 'ref', pH: 7 }, [0.6, 0.5, 0.55]),
    ...series({ row: 'D', column: 1 }, { role: 'blank', pH: 5 }, [0.1, 0.1]),
    ...series({ row: 'D', column: 5 }, { role: 'blank', pH: 6 }, [0.1, 0.1]),
    ...series({ row: 'D', column: 9 }, { role: 'blank', pH: 7 }, [0.1, 0.1]),
    ...series({ row: 'E', column: 1 }, { role: 'sample', variantId: 'other', pH: 6 }, [0.7, 0.8]),
    E3: { role: 'blank', pH: 6, value: 0.1 },
  });

describe('what cannot be analysed gives a typed error', () => {
  it.each([
    ['nothing', null, 'invalid_input'],
    ['a number', 42, 'invalid_input'],
    ['no assay', { ...good(), assay: undefined }, 'invalid_input'],
    ['no variants', { ...good(), variants: [] }, 'no_variants'],
    [
      'a reference that is not a variant',
      { ...good(), referenceVariantId: 'nobody' },
      'unknown_reference_variant',
    ],
    ['no plates', { ...good(), plates: [] }, 'no_plates'],
    ['no reads', { ...good(), plates: good().plates.map((p) => ({ ...p, read: null })) }, 'no_reads'],
    ['an unknown model', { ...good(), settings: { models: { ref: 'quadratic' } } }, 'invalid_setting'],
    ['a negative lag', { ...good(), settings: { lagS: -5 } }, 'invalid_setting'],
    ['a zero reaction time', { ...good(), settings: { reactionTimeMin: 0 } }, 'invalid_setting'],
  ])('%s', (_name, input, code) => {
    const error = errorOf(input);
    expect(error.code).toBe(code);
    expect(error.message.length).toBeGreaterThan(10);
  });

  it('a read of the wrong kind names the plate', () => {
    const input = good();
    input.assay = { ...input.assay, readMode: 'kinetic' };
    expect(errorOf(input)).toMatchObject({
      code: 'read_mismatch',
      message: expect.stringMatching(/Plate 1/),
    });
  });

  it('a kinetic read whose times do not increase', () => {
    const { input } = makeStudy({ seed: 1, reads: 10 });
    input.plates[0].read!.timesS![3] = 5;
    expect(errorOf(input).code).toBe('read_mismatch');
  });

  it('a map well without a role', () => {
    const input = good();
    (input.plates[0].map.wells as Record<string, unknown>).H12 = { role: 'catalyst' };
    expect(errorOf(input)).toMatchObject({ code: 'invalid_input', message: expect.stringMatching(/H12/) });
  });
});

describe('poor data gives flagged nulls', () => {
  it('NaN, Infinity and missing values become nulls with flags', () => {
    const input = good();
    const wells = input.plates[0].read!.wells;
    wells.A1.value = Number.NaN;
    wells.A2.value = Number.POSITIVE_INFINITY;
    wells.A3.value = null;
    const result = run(input);
    for (const w of ['A1', 'A2', 'A3'])
      expect(row(result, 'p1', w)).toMatchObject({ signal: null, activity: null });
    expect(row(result, 'p1', 'A1').flags).toContain('missing_values');
    expect(row(result, 'p1', 'A3').flags).toContain('no_value');
    expect(result.profiles[0].points.find((p) => p.pH === 5)!).toMatchObject({ n: 0, mean: null });
  });

  it('NaN reads inside kinetic traces are skipped; an all-NaN trace has no rate', () => {
    const { input } = makeStudy({ seed: 2 });
    const wells = input.plates[0].read!.wells;
    wells.A1.values = wells.A1.values!.map((v, i) => (i % 7 === 3 ? Number.NaN : v));
    wells.A2.values = wells.A2.values!.map(() => Number.NaN);
    wells.A3.values = wells.A3.values!.slice(5); // shorter than the time axis
    const result = run(input);
    expect(row(result, 'plate-1', 'A1').signal).not.toBeNull();
    expect(row(result, 'plate-1', 'A1').flags).toContain('missing_values');
    expect(row(result, 'plate-1', 'A2')).toMatchObject({ signal: null, activity: null });
    expect(row(result, 'plate-1', 'A2').flags).toContain('too_few_points');
    expect(row(result, 'plate-1', 'A3').flags).toContain('invalid_trace');
  });

  it('a variant with one pH point gets a clear message instead of a fit', () => {
    const result = run(good());
    const other = result.profiles.find((p) => p.variantId === 'other')!;
    expect(other.fit).toBeNull();
    expect(other.curve).toBeNull();
    expect(other.error).toMatchObject({
      code: 'too_few_points',
      message: expect.stringMatching(/^Other: only one pH point \(pH 6\)/),
    });
    expect(other.points).toHaveLength(1);
  });

  it('a variant without wells, and a plate without a read, are said so', () => {
    const input = good();
    input.variants.push({ id: 'ghost', name: 'Ghost', isParent: false, proteinMgPerMl: null });
    input.plates.push({ ...structuredClone(input.plates[0]), id: 'p2', name: 'Plate 2', read: null });
    const result = run(input);
    expect(result.profiles.find((p) => p.variantId === 'ghost')!.error!.code).toBe('no_data');
    expect(row(result, 'p2', 'A1').flags).toContain('no_read');
    expect(result.qc.plates[1]).toMatchObject({ hasRead: false });
    expect(result.notes.map((n) => n.code)).toContain('plate_without_read');
  });

  it('wells naming an unknown variant, or a bad well name, are kept and flagged', () => {
    const input = good();
    input.plates[0].map.wells.H1 = {
      role: 'sample',
      variantId: 'stranger',
      pH: 6,
      buffer: null,
      replicate: 1,
      concentrationUm: null,
    };
    input.plates[0].map.wells.Z9 = {
      role: 'sample',
      variantId: 'ref',
      pH: 6,
      buffer: null,
      replicate: 4,
      concentrationUm: null,
    };
    const result = run(input);
    expect(result.notes.map((n) => n.code)).toContain('unknown_variant');
    expect(row(result, 'p1', 'Z9').flags).toContain('not_a_well');
  });
});

describe('random damage to a generated study never throws', () => {
  it('(property) any field replaced by junk gives ok or a typed error, and plain JSON', () => {
    const { input } = makeStudy({
      seed: 9,
      reads: 12,
      replicates: 2,
      blanksPerPoint: 2,
      format: 96,
      variants: DEFAULT_VARIANTS.slice(0, 2),
    });
    const junk = fc.constantFrom<unknown>(null, undefined, Number.NaN, -1, 0, '', 'x', [], {}, [Number.NaN], {
      startS: 5,
      endS: 1,
    });
    const paths: ((s: Record<string, unknown>, v: unknown) => void)[] = [
      (s, v) => ((s.assay as Record<string, unknown>).extinctionCoefficient = v),
      (s, v) => ((s.assay as Record<string, unknown>).pathLengthCm = v),
      (s, v) => ((s.assay as Record<string, unknown>).chromophorePka = v),
      (s, v) => ((s.assay as Record<string, unknown>).stopSolution = v),
      (s, v) => ((s.variants as Record<string, unknown>[])[0].proteinMgPerMl = v),
      (s, v) => ((s.variants as Record<string, unknown>[])[1].name = v),
      (s, v) => ((s.settings as Record<string, unknown>).enzymeVolumeUl = v),
      (s, v) => ((s.settings as Record<string, unknown>).rateWindows = { plate: { 'plate-1': v } }),
      (s, v) => ((s.plates as { read: { wells: Record<string, unknown> } }[])[0].read.wells.A1 = v),
      (s, v) =>
        ((s.plates as { read: { wells: Record<string, { values: unknown }> } }[])[0].read.wells.B2.values =
          v),
      (s, v) => ((s.plates as { map: { wells: Record<string, unknown> } }[])[0].map.wells.A2 = v),
      (s, v) => (s.exclusions = v),
      (s, v) => (s.settings = v),
    ];
    fc.assert(
      fc.property(fc.integer({ min: 0, max: paths.length - 1 }), junk, (which, value) => {
        const damaged = structuredClone(input) as unknown as Record<string, unknown>;
        paths[which](damaged, value);
        const r = analyseStudy(damaged as unknown as AnalysisInput);
        if (r.ok) expect(nonFinite(r.value)).toEqual([]);
        else expect(r.error.code).not.toBe('internal_error');
      }),
      { numRuns: 150, seed: 42 },
    );
  });
});
