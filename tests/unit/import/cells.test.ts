// Reading single cells: numbers as text, decimal commas, saturation and empty markers, times,
// well names and wavelengths in labels.
import { describe, expect, it } from 'vitest';
import { wavelengthsOf } from '../../../server/import/labels';
import { parseNumberText, readMeasure } from '../../../server/import/measure';
import { isTimeHeader, readTime, resolveBareTimes, unitFromHeader } from '../../../server/import/time';
import { parseWellName, wellName } from '../../../server/import/wells';

const text = (v: string) => ({ t: 's' as const, v });

describe('numbers written as text', () => {
  it('reads decimal points, decimal commas and scientific notation without thousands separators', () => {
    expect(parseNumberText('0.123')).toBe(0.123);
    expect(parseNumberText('0,123')).toBe(0.123);
    expect(parseNumberText(' -1.5e-3 ')).toBe(-0.0015);
    expect(parseNumberText('1,5E+2')).toBe(150);
    expect(parseNumberText('.5')).toBe(0.5);
    expect(parseNumberText('\u22120.25')).toBe(-0.25); // U+2212 minus sign
  });

  it('refuses what is not one plain finite number', () => {
    for (const bad of ['1,234.5', '1.2.3', 'abc', '12 mM', '1e400', '', '0x10', 'Infinity'])
      expect(parseNumberText(bad), bad).toBeNull();
  });
});

describe('a cell read as a measured value', () => {
  it('marks saturated readings as missing, never as zero', () => {
    for (const marker of [
      'OVER',
      'over',
      'Overflow',
      'OVRFLW',
      'Sat',
      'saturated',
      '>3.5',
      '> 4,000',
      '≥3.5',
      '****',
      '###',
    ]) {
      expect(readMeasure(text(marker)), marker).toEqual({ value: null, flag: 'saturated', raw: marker });
    }
  });

  it('marks blank or dashed cells as empty', () => {
    expect(readMeasure(undefined)).toEqual({ value: null, flag: 'empty', raw: '' });
    for (const blank of ['   ', '-', 'n/a', 'NA', '—'])
      expect(readMeasure(text(blank)).value === null && readMeasure(text(blank))).toMatchObject({
        flag: 'empty',
      });
  });

  it('marks anything else unreadable as invalid, keeping what was written', () => {
    expect(readMeasure(text('<0.001'))).toEqual({ value: null, flag: 'invalid', raw: '<0.001' });
    expect(readMeasure({ t: 'e', v: '#N/A' })).toEqual({ value: null, flag: 'invalid', raw: '#N/A' });
    expect(readMeasure({ t: 'f', formula: 'A1/0' })).toEqual({ value: null, flag: 'invalid', raw: '=A1/0' });
    expect(readMeasure({ t: 'm', master: 'B3' })).toEqual({
      value: null,
      flag: 'invalid',
      raw: '(merged with B3)',
    });
    expect(readMeasure({ t: 'b', v: true })).toMatchObject({ value: null, flag: 'invalid' });
    expect(readMeasure({ t: 'n', v: Infinity })).toMatchObject({ value: null, flag: 'invalid' });
  });

  it('keeps zero and negative readings as the numbers they are', () => {
    expect(readMeasure({ t: 'n', v: 0 })).toEqual({ value: 0 });
    expect(readMeasure(text('-0,002'))).toEqual({ value: -0.002 });
  });
});

describe('kinetic times', () => {
  // 1 min = 60 s, 1 h = 3600 s, 1 day = 86,400 s (SI-accepted units).
  it('recognises time headers and their units', () => {
    expect(
      ['Time', 'Time [s]', 'time (min)', 'Elapsed time', 'Kinetic time/h', 't (s)', 'T [s]'].every(
        isTimeHeader,
      ),
    ).toBe(true);
    expect(['Timer', 'Temperature', 'Well', 'Total'].some(isTimeHeader)).toBe(false);
    expect(unitFromHeader('Time [s]')).toBe('s');
    expect(unitFromHeader('Time (sec)')).toBe('s');
    expect(unitFromHeader('Time (min)')).toBe('min');
    expect(unitFromHeader('Time/h')).toBe('h');
    expect(unitFromHeader('Time in minutes')).toBe('min');
    expect(unitFromHeader('t (ms)')).toBe('ms');
    expect(unitFromHeader('Time [hh:mm:ss]')).toBe('clock');
    expect(unitFromHeader('Time')).toBeNull();
  });

  it('reads every spelling into seconds', () => {
    const seconds = (cell: Parameters<typeof readTime>[0], unit: Parameters<typeof readTime>[1] = null) => {
      const read = readTime(cell, unit);
      return read.kind === 'time' ? read.seconds : read;
    };
    expect(seconds({ t: 'n', v: 30 }, 's')).toBe(30);
    expect(seconds({ t: 'n', v: 1.5 }, 'min')).toBe(90);
    expect(seconds({ t: 'n', v: 0.1 }, 'min')).toBe(6); // not 6.000000000000001
    expect(seconds({ t: 'n', v: 2 }, 'h')).toBe(7200);
    expect(seconds(text('1:30'))).toBe(90);
    expect(seconds(text('12:05'))).toBe(725);
    expect(seconds(text('1:02:03'))).toBe(3723);
    expect(seconds(text('0:00:30,5'))).toBe(30.5);
    expect(seconds(text('30 s'))).toBe(30);
    expect(seconds(text('2 min'))).toBe(120);
    expect(seconds(text('1 min 30 s'))).toBe(90);
    expect(seconds(text('1 h 2 min'))).toBe(3720);
    expect(seconds(text('250 ms'))).toBe(0.25);
    expect(seconds({ t: 'd', days: 30 / 86_400 })).toBe(30);
    expect(seconds({ t: 'd', days: 1.5 })).toBe(129_600);
  });

  it('calls an impossible clock time invalid, with the spelling it expected', () => {
    expect(readTime(text('1:75'), null)).toEqual({
      kind: 'bad',
      reason: "the time '1:75' is not a valid m:ss time",
    });
    expect(readTime(text('0:61:00'), null)).toEqual({
      kind: 'bad',
      reason: "the time '0:61:00' is not a valid h:mm:ss time",
    });
    expect(readTime({ t: 'f', formula: 'A2+1' }, null)).toMatchObject({ kind: 'bad' });
    expect(readTime({ t: 'n', v: -1 }, 's')).toMatchObject({ kind: 'bad' });
  });

  it('ends the table at text that is not a time', () => {
    expect(readTime(text('Mean'), 's')).toEqual({ kind: 'none' });
    expect(readTime(undefined, 's')).toEqual({ kind: 'none' });
  });

  it('gives bare numbers one unit: fractions of a day below one day, else seconds', () => {
    expect(resolveBareTimes([0, 30 / 86_400, 60 / 86_400])).toMatchObject({
      seconds: [0, 30, 60],
      spelling: 'spreadsheet time',
    });
    expect(resolveBareTimes([0, 30, 60])).toMatchObject({ seconds: [0, 30, 60], spelling: 's' });
    expect(resolveBareTimes([0, 0.5, 1.5])).toMatchObject({ seconds: [0, 0.5, 1.5], spelling: 's' });
  });
});

describe('well names', () => {
  it('reads A1 and A01 spellings within A1..P24', () => {
    expect(parseWellName('A1')).toEqual({ row: 0, column: 0 });
    expect(parseWellName('A01')).toEqual({ row: 0, column: 0 });
    expect(parseWellName('p24')).toEqual({ row: 15, column: 23 });
    expect(parseWellName('H012')).toEqual({ row: 7, column: 11 });
    for (const bad of ['A0', 'A25', 'Q1', 'AA1', '1A', 'A', 'Well'])
      expect(parseWellName(bad), bad).toBeNull();
    expect(wellName({ row: 15, column: 23 })).toBe('P24');
  });
});

describe('wavelengths written in labels', () => {
  it('finds the read wavelength in the spellings labels use', () => {
    const nm = (label: string) => wavelengthsOf(label).nm;
    expect(nm('Absorbance 405 nm')).toBe(405);
    expect(nm('Abs @ 450nm')).toBe(450);
    expect(nm('OD600')).toBe(600);
    expect(nm('A340')).toBe(340);
    expect(nm('Read 2: 340')).toBe(340);
    expect(nm('Wavelength: 562')).toBe(562);
    expect(nm('Plate 7 end-point read')).toBeNull();
    expect(nm('Read 2')).toBeNull();
    expect(nm('Absorbance 12 nm')).toBeNull(); // outside 190–1100 nm: not a plate-reader wavelength
  });

  it('finds excitation and emission of fluorescence reads', () => {
    expect(wavelengthsOf('Fluorescence Ex 485 / Em 520')).toEqual({
      nm: null,
      excitationNm: 485,
      emissionNm: 520,
    });
    expect(wavelengthsOf('Excitation 340 nm, emission 460 nm')).toEqual({
      nm: null,
      excitationNm: 340,
      emissionNm: 460,
    });
    expect(wavelengthsOf('Fluorescence 485/520')).toEqual({ nm: null, excitationNm: 485, emissionNm: 520 });
  });
});
