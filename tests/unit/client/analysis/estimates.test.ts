import { describe, expect, it } from 'vitest';
import { formatInterval, formatNumber, sigFor } from '@/features/analysis/utils/format-estimate';
import { intervalMarks, pickInterval } from '@/lib/intervals';

describe('numbers of the parameter tables', () => {
  it('when a style gives decimals or significant figures, then the number is written that way, with a true minus', () => {
    expect(formatNumber(3.7312, { decimals: 2 })).toBe('3.73');
    expect(formatNumber(12.345, { sig: 3 })).toBe('12.3');
    expect(formatNumber(-0.5, { decimals: 1 })).toBe('−0.5');
    expect(formatNumber(null, { decimals: 2 })).toBe('—');
  });

  it('when a value has an interval, then it keeps two figures of the half-width', () => {
    // 3.73 ± 0.04: the half-width's two figures reach the thousandths, so 4 figures.
    expect(sigFor(3.73, [3.69, 3.77])).toBe(4);
    // 1234 ± 100: two figures of the half-width reach the tens, so 3 figures.
    expect(sigFor(1234, [1134, 1334])).toBe(3);
    expect(sigFor(1234, [1334, 1134])).toBe(3);
  });

  it('when the interval is very wide or very narrow, then the figures stay between 2 and 6', () => {
    expect(sigFor(5, [-1000, 1000])).toBe(2);
    expect(sigFor(123456.789, [123456.7889, 123456.7891])).toBe(6);
  });

  it('when there is no interval, an open end, a zero width or a zero value, then the fallback is used', () => {
    expect(sigFor(3.7, null)).toBe(3);
    expect(sigFor(3.7, [null, 4])).toBe(3);
    expect(sigFor(3.7, [3, null], 4)).toBe(4);
    expect(sigFor(3.7, [3.7, 3.7])).toBe(3);
    expect(sigFor(0, [-1, 1])).toBe(3);
    expect(sigFor(null, [1, 2])).toBe(3);
  });

  it('when an interval is written, then both ends are given and an open end says so', () => {
    expect(formatInterval([3.69, 3.77], { decimals: 2 })).toBe('3.69 to 3.77');
    expect(formatInterval([null, 8.25], { decimals: 2 })).toBe('open to 8.25');
    expect(formatInterval([4.1, null], { decimals: 1 })).toBe('4.1 to open');
    expect(formatInterval([-0.25, 0.5], { decimals: 2 })).toBe('−0.25 to 0.50');
    expect(formatInterval(null, { decimals: 2 })).toBe('');
  });
});

describe('which interval a value is shown with', () => {
  const e = {
    value: 5,
    ci95: [4.8, 5.2] as [number, number],
    profile95: [4.7, 5.4] as [number, number],
    boot95: [4.75, 5.3] as [number, number],
  };

  it('when a current bootstrap exists, then its percentile interval is shown', () => {
    expect(pickInterval(e, true)).toEqual({ kind: 'bootstrap', interval: [4.75, 5.3] });
  });

  it('when the bootstrap is stale or absent, then the profile-likelihood interval is shown', () => {
    expect(pickInterval(e, false)).toEqual({ kind: 'profile', interval: [4.7, 5.4] });
    expect(pickInterval({ ...e, boot95: null }, true)).toEqual({ kind: 'profile', interval: [4.7, 5.4] });
  });

  it('when neither exists, then the t interval is shown, and with none at all nothing is', () => {
    expect(pickInterval({ value: 5, ci95: [4.8, 5.2] }, true)).toEqual({ kind: 't', interval: [4.8, 5.2] });
    expect(pickInterval({ value: 5, ci95: null, profile95: null, boot95: null }, true)).toBeNull();
    expect(pickInterval(null, true)).toBeNull();
    expect(pickInterval(undefined, false)).toBeNull();
  });

  it('when a profile interval has an open end, then it is still preferred to the t interval', () => {
    expect(pickInterval({ value: 5, ci95: [4.8, 5.2], profile95: [4.7, null] }, false)).toEqual({
      kind: 'profile',
      interval: [4.7, null],
    });
  });

  it('when the marks are listed, then each kind has its own short mark and words', () => {
    const marks = Object.values(intervalMarks).map((m) => m.mark);
    expect(new Set(marks).size).toBe(3);
    expect(intervalMarks.bootstrap.words).toContain('bootstrap');
    expect(intervalMarks.profile.words).toContain('profile-likelihood');
  });
});
