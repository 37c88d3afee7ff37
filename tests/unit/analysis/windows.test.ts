// Rate windows on a GENERATED study (tests/fixtures/analysis/make-study.ts, invented data):
// a well's window beats its variant's, which beats its plate's, which beats the automatic window.
import { describe, expect, it } from 'vitest';
import { analyseStudy, resolveWindow, type AnalysisResult } from '../../../shared/analysis';
import { initialRate } from '../../../shared/plate';
import { makeStudy } from '../../fixtures/analysis/make-study';
import { row } from './helpers';

const study = makeStudy({ seed: 5, plates: 2, variantsOnEveryPlate: true });
const input = study.input;
input.settings.rateWindows = {
  plate: { 'plate-1': { startS: 60, endS: 400 } },
  variant: { 'v-a': { startS: 100, endS: 300 } },
  well: { 'plate-1:A2': { startS: 200, endS: 500 }, 'plate-2:A2': { startS: 30, endS: 250 } },
};
const r = analyseStudy(input);
if (!r.ok) throw new Error(r.error.message);
const result: AnalysisResult = r.value;
const firstOf = (plateId: string, variantId: string, role = 'sample') =>
  result.wells.find(
    (w) => w.plateId === plateId && w.role === role && (role !== 'sample' || w.variantId === variantId),
  )!;

describe('which rate window applies', () => {
  it('uses the well window over every other (plate-1:A2 is FR1-WT, on a plate with a plate window)', () => {
    expect(row(result, 'plate-1', 'A2').window).toEqual({
      startS: 200,
      endS: 500,
      automatic: false,
      source: 'well',
    });
    expect(row(result, 'plate-2', 'A2').window).toEqual({
      startS: 30,
      endS: 250,
      automatic: false,
      source: 'well',
    });
  });

  it('uses the variant window over the plate window', () => {
    for (const plateId of ['plate-1', 'plate-2']) {
      expect(firstOf(plateId, 'v-a').window).toEqual({
        startS: 100,
        endS: 300,
        automatic: false,
        source: 'variant',
      });
    }
  });

  it('uses the plate window where nothing more specific is set, blanks included', () => {
    expect(row(result, 'plate-1', 'A1').window).toEqual({
      startS: 60,
      endS: 400,
      automatic: false,
      source: 'plate',
    });
    expect(firstOf('plate-1', '', 'blank').window).toMatchObject({ startS: 60, endS: 400, source: 'plate' });
  });

  it('finds the window automatically otherwise; blanks then use every read', () => {
    expect(row(result, 'plate-2', 'A1').window).toMatchObject({
      automatic: true,
      source: 'automatic',
      startS: 0,
    });
    // Generated reads every 10 s for 60 reads: 0…590 s (make-study.ts defaults).
    expect(firstOf('plate-2', '', 'blank').window).toEqual({
      startS: 0,
      endS: 590,
      automatic: false,
      source: 'all-reads',
    });
  });

  it('computes the rate over exactly that window (shared/plate initialRate, per minute)', () => {
    const trace = input.plates[0].read!.wells.A2.values!;
    const direct = initialRate(
      { times: input.plates[0].read!.timesS!, values: trace },
      { window: { start: 200, end: 500 } },
    );
    if (!direct.ok) throw new Error(direct.error.message);
    expect(row(result, 'plate-1', 'A2').signal!).toBeCloseTo(direct.value.slope! * 60, 12);
    expect(row(result, 'plate-1', 'A2').n).toBe(31); // reads at 200, 210, …, 500 s
  });

  it('resolveWindow states the same order', () => {
    const settings = input.settings;
    expect(resolveWindow(settings, 'plate-1', 'A2', 'v-wt').source).toBe('well');
    expect(resolveWindow(settings, 'plate-1', 'A3', 'v-a').source).toBe('variant');
    expect(resolveWindow(settings, 'plate-1', 'A3', 'v-wt').source).toBe('plate');
    expect(resolveWindow(settings, 'plate-2', 'A3', 'v-wt')).toEqual({ window: null, source: 'automatic' });
    expect(resolveWindow({}, 'plate-1', 'A2', null)).toEqual({ window: null, source: 'automatic' });
  });

  it('refuses a window that ends before it starts', () => {
    const bad = analyseStudy({
      ...input,
      settings: { rateWindows: { well: { 'plate-1:A1': { startS: 300, endS: 100 } } } },
    });
    expect(bad.ok).toBe(false);
    if (!bad.ok)
      expect(bad.error).toMatchObject({
        code: 'invalid_setting',
        message: expect.stringMatching(/plate-1:A1/),
      });
  });
});
