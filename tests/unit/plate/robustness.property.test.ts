import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import * as plate from '@shared/plate';
import { nonFiniteNumbers } from './plain-json';

const junkNumber = fc.oneof(
  fc.double(),
  fc.constant(null),
  fc.constant(Number.NaN),
  fc.constant(Infinity),
  fc.constant(-Infinity),
  fc.constant(1e308),
  fc.constant(-1e308),
  fc.constant(5e-324),
  fc.string({ maxLength: 3 }),
);
const junkList = fc.oneof(fc.array(junkNumber, { maxLength: 25 }), fc.anything());

/** The call returns a result (never throws), and an ok value is plain JSON. */
function plainResult(call: () => unknown): void {
  const r = call() as plate.PlateResult<unknown>;
  expect(typeof r.ok).toBe('boolean');
  if (r.ok) expect(nonFiniteNumbers(r.value)).toEqual([]);
  else expect(r.error.message.length).toBeGreaterThan(0);
}

const RUNS = { numRuns: 300, seed: 42 };

describe('no input crashes the plate statistics, and results are plain JSON', () => {
  it('replicate statistics, outliers, Z′ and blanks', () => {
    fc.assert(
      fc.property(junkList, junkList, (a, b) => {
        plainResult(() => plate.replicateStats(a as never));
        plainResult(() => plate.flagOutliers(a as never));
        plainResult(() => plate.zPrimeFactor(a as never, b as never));
        plainResult(() => plate.blankStats(a as never));
      }),
      RUNS,
    );
  });

  it('blank correction, blank drift and standard curves', () => {
    const item = fc.record({
      group: fc.constantFrom('a', 'b'),
      id: fc.string(),
      value: junkNumber,
      pH: junkNumber,
      concentration: junkNumber,
      signal: junkNumber,
    });
    fc.assert(
      fc.property(fc.array(item, { maxLength: 20 }), fc.array(item, { maxLength: 20 }), (samples, blanks) => {
        plainResult(() => plate.correctForBlanks(samples as never, blanks as never));
        plainResult(() => plate.blankDrift(samples as never));
        const curve = plate.fitStandardCurve(samples as never);
        plainResult(() => curve);
        if (curve.ok) {
          plainResult(() => plate.concentrationFromSignal(curve.value, samples[0]?.signal as never));
          plainResult(() => plate.rateFromSignalSlope(curve.value, samples[0]?.signal as never, 1));
        }
      }),
      RUNS,
    );
  });

  it('plate trends and end points on any well map', () => {
    const wells = fc.dictionary(
      fc.oneof(fc.constantFrom(...plate.listWells(96).map((w) => w.name)), fc.string({ maxLength: 4 })),
      junkNumber,
      { maxKeys: 96 },
    );
    fc.assert(
      fc.property(wells, fc.constantFrom(96, 384, 48), (values, format) => {
        plainResult(() => plate.plateTrends(values, format as never));
        plainResult(() => plate.endpointValues(values));
      }),
      RUNS,
    );
  });

  it('conversions', () => {
    fc.assert(
      fc.property(junkNumber, junkNumber, junkNumber, junkNumber, (a, b, c, d) => {
        const epsilon = { value: b, unit: 'M-1cm-1' } as never;
        plainResult(() =>
          plate.rateFromAbsorbanceSlope(a as never, {
            epsilon,
            pathLengthCm: c as never,
            timeUnit: 'min',
            slopeSe: d as never,
          }),
        );
        plainResult(() =>
          plate.concentrationFromAbsorbance(a as never, { epsilon, pathLengthCm: c as never }),
        );
        plainResult(() => plate.effectiveExtinction(epsilon, c as never, d as never));
        plainResult(() => plate.pathLengthFromVolume({ volumeUl: a as never, wellDiameterMm: b as never }));
        plainResult(() =>
          plate.specificActivity({
            rateMolarPerSecond: a as never,
            wellVolumeUl: b as never,
            enzymeVolumeUl: c as never,
            proteinMgPerMl: d as never,
          }),
        );
        plainResult(() => plate.parseWell(a as never, 96));
      }),
      RUNS,
    );
  });

  it('initial rates with any trace and any options', () => {
    fc.assert(
      fc.property(fc.anything(), fc.anything(), junkList, (trace, options, values) => {
        plainResult(() => plate.initialRate(trace as never, options as never));
        plainResult(() =>
          plate.initialRate({ times: [0, 1, 2, 3, 4, 5], values: values as never }, options as never),
        );
        plainResult(() => plate.initialRates(values as never, { A1: values } as never));
      }),
      RUNS,
    );
  });
});
