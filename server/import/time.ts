// Reading kinetic time stamps in the spellings plate readers and spreadsheets use:
// seconds, minutes or hours (unit in the column header or beside the number), "m:ss", "h:mm:ss",
// "1 min 30 s", and spreadsheet time values (fractions of a day; exceljs gives Date objects for
// time-formatted cells, which the xlsx reader has already turned back into serial days).
import type { Cell } from './grid';
import { parseNumberText } from './measure';

export type TimeUnit = 'ms' | 's' | 'min' | 'h';
/** What a column header says about its times. */
export type HeaderUnit = TimeUnit | 'clock' | null;

export type TimeRead =
  | { kind: 'time'; seconds: number; spelling: string }
  | { kind: 'number'; value: number } // a bare number; the table decides its unit
  | { kind: 'bad'; reason: string } // meant as a time, but not a valid one
  | { kind: 'none' }; // not a time: the table ends here

const SECONDS_PER: Record<TimeUnit, number> = { ms: 0.001, s: 1, min: 60, h: 3600 };
const SECONDS_PER_DAY = 86_400;

const UNIT_WORDS: [RegExp, TimeUnit][] = [
  [/^(?:ms|msec|milliseconds?)$/i, 'ms'],
  [/^(?:s|sec|secs|seconds?)$/i, 's'],
  [/^(?:m|min|mins|minutes?)$/i, 'min'],
  [/^(?:h|hr|hrs|hours?)$/i, 'h'],
];

/** A column header that names a time column: "Time", "Time [s]", "t (min)", "Elapsed time/h". */
export function isTimeHeader(text: string): boolean {
  return /^(?:(?:elapsed|kinetic|read|reading|cycle)\s+)?time\b/i.test(text) || /^t\s*[[(/]/i.test(text);
}

/** The unit a time header states, if any: "Time [s]" -> 's'; "Time (hh:mm:ss)" -> 'clock'. */
export function unitFromHeader(text: string): HeaderUnit {
  if (/h+:mm(?::ss)?|m+:ss/i.test(text)) return 'clock';
  const rest = text.replace(/^.*?\btime\b|^t(?=\s*[[(/])/i, '');
  const token = /[[(/]\s*([a-zµ]+)\s*[\])]?|\bin\s+([a-z]+)/i.exec(rest);
  const word = token?.[1] ?? token?.[2];
  if (!word) return null;
  for (const [pattern, unit] of UNIT_WORDS) if (pattern.test(word)) return unit;
  return null;
}

const CLOCK = /^(\d+):(\d{1,2})(?::(\d{1,2}(?:[.,]\d+)?))?$/;
const COMPOUND =
  /^(?:(\d+(?:[.,]\d+)?)\s*h(?:rs?|ours?)?)?\s*(?:(\d+(?:[.,]\d+)?)\s*m(?:in(?:s|utes?)?)?)?\s*(?:(\d+(?:[.,]\d+)?)\s*s(?:ecs?|econds?)?)?$/i;
const MILLISECONDS = /^(\d+(?:[.,]\d+)?)\s*ms$/i;

/** Microsecond rounding keeps 0.1 min from printing as 6.000000000000001 s. */
export function roundSeconds(seconds: number): number {
  return Math.round(seconds * 1e6) / 1e6;
}

/** Spreadsheet time (days) -> seconds, rounded to the millisecond spreadsheets store. */
export function daysToSeconds(days: number): number {
  return Math.round(days * SECONDS_PER_DAY * 1000) / 1000;
}

export function readTime(cell: Cell | undefined, unit: HeaderUnit): TimeRead {
  if (!cell) return { kind: 'none' };
  switch (cell.t) {
    case 'n':
      return fromNumber(cell.v, unit);
    case 'd':
      return { kind: 'time', seconds: daysToSeconds(cell.days), spelling: 'spreadsheet time' };
    case 's':
      return fromText(cell.v.trim(), unit);
    case 'f':
      return { kind: 'bad', reason: `the time is a formula (=${cell.formula}) saved without its result` };
    case 'e':
      return { kind: 'bad', reason: `the time cell holds the error ${cell.v}` };
    default:
      return { kind: 'none' };
  }
}

function fromNumber(value: number, unit: HeaderUnit): TimeRead {
  if (!Number.isFinite(value)) return { kind: 'bad', reason: `the time ${value} is not a finite number` };
  if (value < 0) return { kind: 'bad', reason: `the time ${value} is negative` };
  if (unit && unit !== 'clock') {
    return { kind: 'time', seconds: roundSeconds(value * SECONDS_PER[unit]), spelling: unit };
  }
  return { kind: 'number', value };
}

function fromText(text: string, unit: HeaderUnit): TimeRead {
  if (text === '') return { kind: 'none' };
  const asNumber = parseNumberText(text);
  if (asNumber !== null) return fromNumber(asNumber, unit);
  const clock = CLOCK.exec(text);
  if (clock) return fromClock(text, clock);
  const ms = MILLISECONDS.exec(text);
  if (ms) return { kind: 'time', seconds: roundSeconds(decimal(ms[1]) / 1000), spelling: 'ms' };
  const compound = COMPOUND.exec(text);
  if (compound && (compound[1] || compound[2] || compound[3])) {
    const [h, m, s] = [compound[1], compound[2], compound[3]].map((part) => (part ? decimal(part) : 0));
    const spelling = compound[1] ? 'h' : compound[2] ? 'min' : 's';
    return { kind: 'time', seconds: roundSeconds(h * 3600 + m * 60 + s), spelling };
  }
  if (/^\d+\s*:\s*\d/.test(text)) {
    return { kind: 'bad', reason: `the time '${text}' is not a valid m:ss or h:mm:ss time` };
  }
  return { kind: 'none' };
}

function fromClock(text: string, clock: RegExpExecArray): TimeRead {
  const spelling = clock[3] === undefined ? 'm:ss' : 'h:mm:ss';
  const parts =
    clock[3] === undefined
      ? [0, Number(clock[1]), decimal(clock[2])]
      : [Number(clock[1]), Number(clock[2]), decimal(clock[3])];
  const [h, m, s] = parts;
  const minutesOk = spelling === 'm:ss' || m < 60;
  if (!minutesOk || s >= 60)
    return { kind: 'bad', reason: `the time '${text}' is not a valid ${spelling} time` };
  return { kind: 'time', seconds: roundSeconds(h * 3600 + m * 60 + s), spelling };
}

function decimal(text: string): number {
  return Number(text.replace(',', '.'));
}

/**
 * Bare numbers under a header without a unit. Values all below one day that are not whole numbers
 * are spreadsheet time (fractions of a day, as exceljs gives numbers without a time format);
 * anything else is read as seconds, the unit readers use most (common practice, no source).
 */
export function resolveBareTimes(values: number[]): { seconds: number[]; spelling: string; assumed: string } {
  const fractionsOfDay = values.every((v) => v < 1) && values.some((v) => !Number.isInteger(v));
  if (fractionsOfDay) {
    return {
      seconds: values.map(daysToSeconds),
      spelling: 'spreadsheet time',
      assumed: 'fractions of a day (spreadsheet time)',
    };
  }
  return { seconds: values.map(roundSeconds), spelling: 's', assumed: 'seconds' };
}
