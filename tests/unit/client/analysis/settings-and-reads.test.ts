import { describe, expect, it } from 'vitest';
import { resolveWindow } from '@shared/analysis';
import { analysisSettingsSchema, type StudyAnalysisSettings } from '@shared/schemas/analysis';
import type { ReadSummary } from '@shared/schemas/plates-types';
import { readInUse, windowLine } from '@/features/analysis/utils/reads';
import { windowKey, withEntry, withWindow } from '@/features/analysis/utils/settings-edit';

const PLATE = '11111111-1111-4111-8111-111111111111';
const VARIANT = '22222222-2222-4222-8222-222222222222';
const READ_A = '33333333-3333-4333-8333-333333333333';
const target = { plateId: PLATE, well: 'B7', variantId: VARIANT };

describe('rate windows in the analysis settings', () => {
  it('when a window is set for each scope, then the analysis finds it under the key the screen wrote', () => {
    for (const scope of ['well', 'variant', 'plate'] as const) {
      const key = windowKey(scope, target);
      expect(key).not.toBeNull();
      const settings = withWindow({}, scope, key as string, { startS: 30, endS: 300 });
      expect(analysisSettingsSchema.safeParse(settings).success).toBe(true);
      expect(resolveWindow(settings, PLATE, 'B7', VARIANT)).toEqual({
        window: { startS: 30, endS: 300 },
        source: scope,
      });
    }
  });

  it('when a well has no variant, then the variant scope has no key', () => {
    expect(windowKey('variant', { ...target, variantId: null })).toBeNull();
    expect(windowKey('well', target)).toBe(`${PLATE}:B7`);
    expect(windowKey('plate', target)).toBe(PLATE);
  });

  it('when the last window of a scope is cleared, then the scope and then the windows disappear', () => {
    const one = withWindow({ lagS: 10 }, 'plate', PLATE, { startS: 0, endS: 120 });
    const two = withWindow(one, 'variant', VARIANT, { startS: 60, endS: 600 });
    const fewer = withWindow(two, 'plate', PLATE, null);
    expect(fewer).toEqual({ lagS: 10, rateWindows: { variant: { [VARIANT]: { startS: 60, endS: 600 } } } });
    expect(withWindow(fewer, 'variant', VARIANT, null)).toEqual({ lagS: 10 });
  });

  it('when a window is set again, then it replaces the old one and leaves the others', () => {
    const other = '44444444-4444-4444-8444-444444444444';
    const s = withWindow(withWindow({}, 'plate', PLATE, { startS: 0, endS: 100 }), 'plate', other, {
      startS: 5,
      endS: 50,
    });
    const again = withWindow(s, 'plate', PLATE, { startS: 20, endS: 200 });
    expect(again.rateWindows?.plate).toEqual({
      [PLATE]: { startS: 20, endS: 200 },
      [other]: { startS: 5, endS: 50 },
    });
  });

  it('when settings are edited, then the copy being shown is not changed', () => {
    const before: StudyAnalysisSettings = { rateWindows: { plate: { [PLATE]: { startS: 0, endS: 100 } } } };
    const snapshot = structuredClone(before);
    withWindow(before, 'plate', PLATE, null);
    withWindow(before, 'plate', PLATE, { startS: 1, endS: 2 });
    expect(before).toEqual(snapshot);
  });
});

describe('per-id choices in the analysis settings', () => {
  it('when a model is chosen for a variant, then it is stored; "auto" or nothing removes it', () => {
    const bell = withEntry({}, 'models', VARIANT, 'bell');
    expect(bell).toEqual({ models: { [VARIANT]: 'bell' } });
    expect(analysisSettingsSchema.safeParse(bell).success).toBe(true);
    expect(withEntry(bell, 'models', VARIANT, 'auto')).toEqual({});
    expect(withEntry(bell, 'models', VARIANT, null)).toEqual({});
  });

  it('when a read is chosen for a plate, then it is stored, and an empty choice goes back to the default', () => {
    const chosen = withEntry({ lagS: 5 }, 'plateReads', PLATE, READ_A);
    expect(chosen).toEqual({ lagS: 5, plateReads: { [PLATE]: READ_A } });
    expect(withEntry(chosen, 'plateReads', PLATE, '')).toEqual({ lagS: 5 });
  });

  it('when the newest preparation is chosen again (an empty choice), then the preparation entry goes', () => {
    const chosen = withEntry({}, 'preparations', VARIANT, READ_A);
    expect(chosen).toEqual({ preparations: { [VARIANT]: READ_A } });
    expect(withEntry(chosen, 'preparations', VARIANT, '')).toEqual({});
  });

  it('when another entry of the same field exists, then clearing one keeps the other', () => {
    const other = '55555555-5555-4555-8555-555555555555';
    const s = withEntry(withEntry({}, 'models', VARIANT, 'bell'), 'models', other, 'acid');
    expect(withEntry(s, 'models', VARIANT, 'auto')).toEqual({ models: { [other]: 'acid' } });
    expect(s.models).toEqual({ [VARIANT]: 'bell', [other]: 'acid' });
  });
});

const summary = (id: string, kind: 'endpoint' | 'kinetic', uploadedAt: string): ReadSummary => ({
  id,
  fileId: `f-${id}`,
  fileName: `${id}.xlsx`,
  sha256: '0'.repeat(64),
  kind,
  label: id,
  wavelengthNm: 405,
  sheet: 'Sheet1',
  location: 'A1',
  timesS: kind === 'kinetic' ? [0, 30, 60] : null,
  uploadedBy: 'u',
  uploadedAt,
  wellCount: 96,
  missingCount: 0,
});

describe('which read of a plate the analysis used', () => {
  const reads = [
    summary('old-kinetic', 'kinetic', '2026-01-01T10:00:00Z'),
    summary('new-endpoint', 'endpoint', '2026-03-01T10:00:00Z'),
    summary('mid-kinetic', 'kinetic', '2026-02-01T10:00:00Z'),
  ];

  it('when a read was chosen in the settings, then that read is used', () => {
    expect(readInUse(reads, 'old-kinetic', false)?.id).toBe('old-kinetic');
  });

  it("when none was chosen, then the newest read of the assay's read mode is used", () => {
    expect(readInUse(reads, undefined, true)?.id).toBe('mid-kinetic');
    expect(readInUse(reads, undefined, false)?.id).toBe('new-endpoint');
  });

  it('when the chosen read is gone and none has the read mode, then the newest read is used', () => {
    const endpoints = [
      summary('a', 'endpoint', '2026-01-01T00:00:00Z'),
      summary('b', 'endpoint', '2026-01-02T00:00:00Z'),
    ];
    expect(readInUse(endpoints, 'deleted', true)?.id).toBe('b');
  });

  it('when the plate has no reads, then none is used; the list passed in is not reordered', () => {
    expect(readInUse([], 'x', true)).toBeNull();
    const copy = reads.map((r) => r.id);
    readInUse(reads, undefined, true);
    expect(reads.map((r) => r.id)).toEqual(copy);
  });

  it('when two reads came in the same upload, then the first listed (lowest block, as the server lists them) is used', () => {
    const same = '2026-04-01T08:00:00Z';
    const blocks = [summary('block-0', 'kinetic', same), summary('block-1', 'kinetic', same)];
    expect(readInUse(blocks, undefined, true)?.id).toBe('block-0');
  });
});

describe('the straight line drawn over a rate window', () => {
  const times = [0, 30, 60, 90, 120, 150, 180];
  // signal = 0.1 + 0.002·t exactly (invented trace).
  const values = times.map((t) => 0.1 + 0.002 * t);

  it('when a window holds an exact straight line, then the drawn line has its slope and intercept', () => {
    const line = windowLine(times, values, { startS: 30, endS: 150 });
    expect(line?.slope).toBeCloseTo(0.002, 12);
    expect(line?.intercept).toBeCloseTo(0.1, 12);
  });

  it('when reads inside the window are missing, then the line is fitted to the others', () => {
    const gappy = values.map((v, i) => (i === 2 ? null : v));
    expect(windowLine(times, gappy, { startS: 0, endS: 180 })?.slope).toBeCloseTo(0.002, 12);
  });

  it('when the window holds fewer than three reads, then no line is drawn', () => {
    expect(windowLine(times, values, { startS: 60, endS: 90 })).toBeNull();
    expect(windowLine([], [], { startS: 0, endS: 100 })).toBeNull();
  });

  it('when the times do not increase, then no line is drawn', () => {
    expect(windowLine([0, 60, 30, 90], [1, 2, 3, 4], { startS: 0, endS: 90 })).toBeNull();
  });
});
