// Checks every parse result must pass, whatever the input: a typed error with a message, or
// blocks that are internally whole (every missing value null with a reason, times ascending).
import { expect } from 'vitest';
import { toCliJson, type ParseResult } from '../../../server/import';

export const ERROR_CODES = [
  'empty_file',
  'too_large',
  'too_many_sheets',
  'too_many_cells',
  'unsupported_type',
  'unreadable_workbook',
  'unreadable_text',
  'truncated',
  'invalid_time',
  'duplicate_time',
  'duplicate_well',
  'invalid_well',
  'nothing_found',
];

const LETTERS = 'ABCDEFGHIJKLMNOP';

export function plateWellNames(format: 96 | 384): string[] {
  const [rows, columns] = format === 96 ? [8, 12] : [16, 24];
  const names: string[] = [];
  for (let r = 0; r < rows; r++) for (let c = 1; c <= columns; c++) names.push(`${LETTERS[r]}${c}`);
  return names;
}

export function expectWellFormed(result: ParseResult): void {
  if (!result.ok) {
    // 'internal' would mean an exception escaped the parser's own checks: a defect.
    expect(ERROR_CODES).toContain(result.error.code);
    expect(result.error.message.length).toBeGreaterThan(10);
    expect(result.error.message).not.toMatch(/undefined|\[object Object\]|NaN/);
    return;
  }
  const { blocks } = result.value;
  expect(blocks.length).toBeGreaterThan(0);
  for (const block of blocks) {
    expect([96, 384]).toContain(block.plateFormat);
    const allowed = new Set(plateWellNames(block.plateFormat));
    const names = Object.keys(block.wells);
    expect(names.length).toBeGreaterThan(0);
    for (const name of names) expect(allowed.has(name)).toBe(true);
    if (block.detail.layout === 'plate-grid') expect(names).toEqual(plateWellNames(block.plateFormat));
    for (const flagged of Object.keys(block.flags)) expect(names).toContain(flagged);
    if (block.kind === 'endpoint') {
      for (const name of names) {
        const value = block.wells[name];
        if (value === null) expect(['saturated', 'empty', 'invalid']).toContain(block.flags[name]);
        else {
          expect(Number.isFinite(value)).toBe(true);
          expect(block.flags[name]).toBeUndefined();
        }
      }
    } else {
      const times = block.times_s;
      expect(times.length).toBeGreaterThan(0);
      times.forEach((t, i) => {
        expect(Number.isFinite(t)).toBe(true);
        if (i > 0) expect(t).toBeGreaterThan(times[i - 1]);
      });
      for (const name of names) {
        const series = block.wells[name];
        expect(series.length).toBe(times.length);
        const hasMissing = series.some((v) => v === null);
        series.forEach((v) => v === null || expect(Number.isFinite(v)).toBe(true));
        expect(block.flags[name] !== undefined).toBe(hasMissing);
      }
    }
  }
  // The CLI form survives JSON unchanged (no undefined, NaN or Infinity hiding in it).
  const cli = toCliJson(result.value);
  expect(JSON.parse(JSON.stringify(cli))).toEqual(cli);
}
