import { describe, expect, it } from 'vitest';
import { chooseModel, curveWithBand, evaluateModel, fitCurve, fitGlobal, fitProfile } from '@shared/fitting';
import { prepareProfile } from '@shared/fitting/ph-data';

const pH = [4, 5, 6, 7, 8, 9];
const v = [1, 5, 9, 9, 5, 1];

describe('bad input returns a typed error with a message, never a throw', () => {
  const cases: [string, unknown, unknown, string][] = [
    ['NaN activity', { pH, v: [1, NaN, 9, 9, 5, 1] }, {}, 'not_finite'],
    ['Infinity pH', { pH: [4, 5, Infinity, 7, 8, 9], v }, {}, 'not_finite'],
    ['empty', { pH: [], v: [] }, {}, 'empty'],
    ['length mismatch', { pH, v: [1, 2, 3] }, {}, 'length_mismatch'],
    ['weights of another length', { pH, v, w: [1, 1] }, {}, 'length_mismatch'],
    ['fewer points than parameters', { pH: [4, 5], v: [1, 2] }, { model: 'bell' }, 'too_few_points'],
    ['a single pH value', { pH: [6, 6, 6, 6], v: [1, 2, 3, 4] }, {}, 'single_ph'],
    ['negative weights', { pH, v, w: [1, 1, -1, 1, 1, 1] }, {}, 'negative_weight'],
    ['all weights zero', { pH, v, w: [0, 0, 0, 0, 0, 0] }, {}, 'empty'],
    ['a pH no assay has', { pH: [4, 5, 60, 7, 8, 9], v }, {}, 'ph_out_of_range'],
    ['strings for numbers', { pH: ['4', '5'], v: [1, 2] }, {}, 'not_finite'],
    ['no object at all', null, {}, 'empty'],
    ['an unknown model', { pH, v }, { model: 'gauss' }, 'unknown_model'],
    ['a fractional bootstrap count', { pH, v }, { bootstrap: 2.5 }, 'bad_option'],
    ['an unknown detail', { pH, v }, { detail: 'some' }, 'bad_option'],
  ];
  for (const [what, input, options, code] of cases) {
    it(`fitProfile: ${what} → ${code}`, () => {
      const r = fitProfile(input as never, options as never);
      expect(r.ok).toBe(false);
      if (r.ok) return;
      expect(r.error.code).toBe(code);
      expect(r.error.message.length).toBeGreaterThan(10);
    });
  }

  it('chooseModel, fitGlobal, evaluateModel, curveWithBand and fitCurve do the same', () => {
    const errors = [
      chooseModel({ pH: [], v: [] }),
      fitGlobal([{ pH, v }], { shared: ['pKa1'] }),
      fitGlobal(
        [
          { pH, v },
          { pH, v },
        ],
        { shared: ['pKz'] },
      ),
      evaluateModel('bell', [1, NaN, 8], [5]),
      evaluateModel('nope' as never, [1], [5]),
      curveWithBand({} as never),
      fitCurve({ x: [1, 2], y: [1] }, { names: ['a'], f: (x, b) => b[0] * x }, { start: [1] }),
      fitCurve({ x: [1, 2], y: [1, 2] }, { names: ['a'], f: (x, b) => b[0] * x }, { start: [1, 2] }),
      fitCurve(
        { x: [1, 2], y: [1, 2] },
        {
          names: ['a'],
          f: () => {
            throw new Error('model broke');
          },
        },
        { start: [1] },
      ),
    ];
    for (const r of errors) {
      expect(r.ok).toBe(false);
      if (!r.ok) expect(typeof r.error.message).toBe('string');
    }
  });

  it('gives a result that is plain JSON (no NaN, Infinity, functions or class instances)', () => {
    const r = fitProfile({ pH, v }, { bootstrap: 50 });
    expect(r.ok).toBe(true);
    const text = JSON.stringify(r);
    expect(JSON.parse(text)).toEqual(r);
  });
});

describe('prepared profiles', () => {
  it('count distinct pH values whether or not the points come sorted', () => {
    for (const pH of [
      [5, 5, 6, 7, 7],
      [7, 5, 6, 5, 7],
    ]) {
      const r = prepareProfile({ pH, v: [1, 2, 3, 4, 5] }, 3);
      expect(r.ok && r.value.distinctPH).toBe(3);
    }
    const weighted = prepareProfile({ pH: [5, 6, 7, 8], v: [1, 2, 3, 4], w: [1, 0, 1, 1] }, 3);
    expect(weighted.ok && weighted.value.distinctPH).toBe(3);
  });
});
