import { describe, expect, it } from 'vitest';
import { logAsymptotes, type Line } from '@/features/analysis/utils/log-asymptotes';

const at = (line: Line, pH: number) => line.slope * pH + line.intercept;
const bySlope = (lines: Line[], slope: number) => {
  const found = lines.filter((l) => l.slope === slope);
  expect(found).toHaveLength(1);
  return found[0];
};

// Rate equations of SCIENCE.md §1.1–1.4 (Michaelis' pH functions), used to check that each straight
// stretch is the limit of log10 v far from the pKa values, as the log plot of Dixon 1953 (§1.5) says.
const bell = (pH: number, V: number, pKa1: number, pKa2: number) =>
  V / (1 + 10 ** (pKa1 - pH) + 10 ** (pH - pKa2));
const three = (pH: number, V: number, pKa: number, pKb: number, pKc: number) =>
  V / (1 + 10 ** (pKb - pH) + 10 ** (pKa + pKb - 2 * pH) + 10 ** (pH - pKc));

describe('log-plot asymptotes of the bell (SCIENCE.md §1.2, §1.5)', () => {
  const { lines, meetings } = logAsymptotes('bell', { V: 100, pKa1: 5, pKa2: 8 });

  it('when the bell is fitted, then the slopes are +1, 0 and −1', () => {
    expect(lines.map((l) => l.slope)).toEqual([1, 0, -1]);
  });

  it('when far from both pKa values, then each line is the limit of log10 v', () => {
    expect(at(bySlope(lines, 1), 1)).toBeCloseTo(Math.log10(bell(1, 100, 5, 8)), 3);
    expect(at(bySlope(lines, 0), 6.5)).toBeCloseTo(Math.log10(100), 0);
    expect(at(bySlope(lines, -1), 12)).toBeCloseTo(Math.log10(bell(12, 100, 5, 8)), 3);
    // SCIENCE.md §1.2 check value: pH 3 → 0.9901, two units below pKa1.
    expect(at(bySlope(lines, 1), 3)).toBeCloseTo(Math.log10(0.9901), 2);
  });

  it('when the lines meet, then they meet at the pKa values at height log V', () => {
    expect(meetings).toEqual([
      { name: 'pKa1', pH: 5, log: 2 },
      { name: 'pKa2', pH: 8, log: 2 },
    ]);
    for (const m of meetings) {
      const sloped = bySlope(lines, m.name === 'pKa1' ? 1 : -1);
      expect(at(sloped, m.pH)).toBeCloseTo(m.log, 12);
    }
  });

  it('when the pKa values are far apart, then the curve passes log10 2 below each meeting point (§1.5)', () => {
    const wide = logAsymptotes('bell', { V: 10, pKa1: 3, pKa2: 11 });
    for (const m of wide.meetings) {
      expect(m.log - Math.log10(bell(m.pH, 10, 3, 11))).toBeCloseTo(Math.log10(2), 3);
    }
  });
});

describe('log-plot asymptotes of one limb (SCIENCE.md §1.1)', () => {
  it('when the acid limb is fitted, then a +1 line meets the plateau at pKa, and the curve is half V there', () => {
    const { lines, meetings } = logAsymptotes('acid', { V: 2, pKa: 6 });
    expect(lines).toEqual([
      { slope: 1, intercept: Math.log10(2) - 6 },
      { slope: 0, intercept: Math.log10(2) },
    ]);
    expect(meetings).toEqual([{ name: 'pKa', pH: 6, log: Math.log10(2) }]);
  });

  it('when the alkaline limb is fitted, then the plateau is followed by a −1 line meeting it at pKa', () => {
    const { lines, meetings } = logAsymptotes('base', { V: 1, pKa: 7.5 });
    expect(lines).toEqual([
      { slope: 0, intercept: 0 },
      { slope: -1, intercept: 7.5 },
    ]);
    expect(meetings).toEqual([{ name: 'pKa', pH: 7.5, log: 0 }]);
  });
});

describe('log-plot asymptotes of three ionizations (SCIENCE.md §1.4)', () => {
  const p = { V: 100, pKa: 4, pKb: 5.5, pKc: 8.5 };
  const { lines, meetings } = logAsymptotes('three', p);

  it('when three ionizations are fitted, then the slopes are +2, +1, 0 and −1', () => {
    expect(lines.map((l) => l.slope)).toEqual([2, 1, 0, -1]);
  });

  it('when far from the pKa values, then the +2 and −1 lines are the limits of log10 v', () => {
    expect(at(bySlope(lines, 2), 0)).toBeCloseTo(Math.log10(three(0, 100, 4, 5.5, 8.5)), 3);
    expect(at(bySlope(lines, -1), 13)).toBeCloseTo(Math.log10(three(13, 100, 4, 5.5, 8.5)), 3);
  });

  it('when the lines meet, then +2 meets +1 at pKa, +1 meets 0 at pKb and 0 meets −1 at pKc', () => {
    expect(meetings).toEqual([
      { name: 'pKa', pH: 4, log: 2 + 4 - 5.5 },
      { name: 'pKb', pH: 5.5, log: 2 },
      { name: 'pKc', pH: 8.5, log: 2 },
    ]);
    expect(at(bySlope(lines, 2), 4)).toBeCloseTo(at(bySlope(lines, 1), 4), 12);
    expect(at(bySlope(lines, 1), 5.5)).toBeCloseTo(at(bySlope(lines, 0), 5.5), 12);
    expect(at(bySlope(lines, 0), 8.5)).toBeCloseTo(at(bySlope(lines, -1), 8.5), 12);
  });

  it('when pKb is not determined, then both acid-side lines and their meetings are dropped', () => {
    const r = logAsymptotes('three', { ...p, pKb: null });
    expect(r.lines.map((l) => l.slope)).toEqual([0, -1]);
    expect(r.meetings.map((m) => m.name)).toEqual(['pKc']);
  });
});

describe('log-plot asymptotes of the bell with plateaus (SCIENCE.md §1.3)', () => {
  it('when both plateaus are above zero, then they bound the bell’s three lines on V_mid', () => {
    const { lines, meetings } = logAsymptotes('bell-plateau', {
      V_lo: 20,
      V_mid: 100,
      V_hi: 5,
      pKa1: 5,
      pKa2: 8,
    });
    expect(lines).toEqual([
      { slope: 0, intercept: Math.log10(20) },
      { slope: 1, intercept: 2 - 5 },
      { slope: 0, intercept: 2 },
      { slope: -1, intercept: 2 + 8 },
      { slope: 0, intercept: Math.log10(5) },
    ]);
    expect(meetings).toEqual([
      { name: 'pKa1', pH: 5, log: 2 },
      { name: 'pKa2', pH: 8, log: 2 },
    ]);
  });

  it('when a plateau is zero, then it has no line (log of zero is not drawn)', () => {
    const { lines } = logAsymptotes('bell-plateau', { V_lo: 0, V_mid: 100, V_hi: null, pKa1: 5, pKa2: 8 });
    expect(lines.map((l) => l.slope)).toEqual([1, 0, -1]);
  });
});

describe('log-plot asymptotes of poor fits', () => {
  it('when a pKa is not determined, then its line and meeting are dropped and the rest stay', () => {
    const { lines, meetings } = logAsymptotes('bell', { V: 100, pKa1: 5, pKa2: null });
    expect(lines.map((l) => l.slope)).toEqual([1, 0]);
    expect(meetings.map((m) => m.name)).toEqual(['pKa1']);
  });

  it('when the level is missing, zero, negative or not finite, then nothing is drawn', () => {
    for (const V of [null, undefined, 0, -5, Number.NaN, Number.POSITIVE_INFINITY]) {
      expect(logAsymptotes('bell', { V, pKa1: 5, pKa2: 8 })).toEqual({ lines: [], meetings: [] });
    }
    expect(logAsymptotes('bell-plateau', { V_mid: 0, V_lo: 1, pKa1: 5, pKa2: 8 })).toEqual({
      lines: [],
      meetings: [],
    });
  });

  it('when a pKa is not a finite number, then it counts as not determined', () => {
    const { lines, meetings } = logAsymptotes('acid', { V: 1, pKa: Number.NaN });
    expect(lines).toEqual([{ slope: 0, intercept: 0 }]);
    expect(meetings).toEqual([]);
  });
});
