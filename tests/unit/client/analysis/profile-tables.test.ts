import { describe, expect, it } from 'vitest';
import { parameterRows } from '@/features/analysis/utils/parameter-rows';
import { profileView } from '@/features/analysis/utils/profile-view';
import { derived, estimate, fitOf, point, profileOf, wellRow } from './fixtures';

// Invented fits; the parameter names are those of SCIENCE.md §1.1–1.4.
const bellFit = fitOf(
  'bell',
  {
    V: estimate(100, { profile95: [90, 115] }),
    pKa1: estimate(5.02, { profile95: [4.9, 5.15], boot95: [4.95, 5.1] }),
    pKa2: estimate(7.98, { ci95: [7.9, 8.06] }),
  },
  {
    n: 24,
    pHopt: derived(6.5, { ci95: [6.3, 6.7], boot95: [6.4, 6.6] }),
    window: { lo: derived(4.95), hi: derived(8.05), width: derived(3.1) },
    flags: [{ code: 'residual_runs', message: 'Residuals run in sequence.' }],
  },
);

describe('parameter table rows', () => {
  it('when a bell is fitted, then V and both apparent pKa values fill their columns with the shown interval', () => {
    const [row] = parameterRows([profileOf({ fit: bellFit })], false);
    expect(row.model).toBe('bell');
    expect(row.n).toBe(24);
    expect(row.V).toEqual({
      value: 100,
      interval: [90, 115],
      kind: 'profile',
      name: undefined,
      notDetermined: false,
    });
    expect(row.pKa1).toMatchObject({ value: 5.02, interval: [4.9, 5.15], kind: 'profile' });
    expect(row.pKa2).toMatchObject({ value: 7.98, kind: 't' });
    expect(row.optimum).toMatchObject({ value: 6.5, kind: 't' });
    expect(row.width).toMatchObject({ value: 3.1 });
    expect(row.flags.map((f) => f.code)).toEqual(['residual_runs']);
  });

  it('when the bootstrap is current, then its intervals replace the others where they exist', () => {
    const [row] = parameterRows([profileOf({ fit: bellFit })], true);
    expect(row.pKa1).toMatchObject({ interval: [4.95, 5.1], kind: 'bootstrap' });
    expect(row.optimum).toMatchObject({ interval: [6.4, 6.6], kind: 'bootstrap' });
    expect(row.V).toMatchObject({ kind: 'profile' });
  });

  it('when one limb is fitted, then its pKa goes to the acid or the alkaline column and the other stays empty', () => {
    const [acid, base] = parameterRows(
      [
        profileOf({ fit: fitOf('acid', { V: estimate(50), pKa: estimate(4.6) }) }),
        profileOf({ variantId: 'v2', fit: fitOf('base', { V: estimate(50), pKa: estimate(8.4) }) }),
      ],
      false,
    );
    expect(acid.pKa1).toMatchObject({ value: 4.6, name: 'pKa' });
    expect(acid.pKa2).toBeNull();
    expect(base.pKa1).toBeNull();
    expect(base.pKa2).toMatchObject({ value: 8.4, name: 'pKa' });
  });

  it('when three ionizations are fitted, then the columns show pKb and pKc under their own names', () => {
    const [row] = parameterRows(
      [
        profileOf({
          fit: fitOf('three', { V: estimate(100), pKa: estimate(4), pKb: estimate(5.5), pKc: estimate(8.5) }),
        }),
      ],
      false,
    );
    expect(row.pKa1).toMatchObject({ value: 5.5, name: 'pKb' });
    expect(row.pKa2).toMatchObject({ value: 8.5, name: 'pKc' });
  });

  it('when the plateau model is fitted, then the level column shows V_mid', () => {
    const [row] = parameterRows(
      [
        profileOf({
          fit: fitOf('bell-plateau', {
            V_lo: estimate(20),
            V_mid: estimate(100),
            V_hi: estimate(5),
            pKa1: estimate(5),
            pKa2: estimate(8),
          }),
        }),
      ],
      false,
    );
    expect(row.V).toMatchObject({ value: 100, name: 'V_mid' });
  });

  it('when a pKa is not determined, then its cell says so and has no interval', () => {
    const fit = fitOf('bell', { V: estimate(80), pKa1: estimate(5), pKa2: estimate(null) });
    const [row] = parameterRows([profileOf({ fit })], false);
    expect(row.pKa2).toEqual({
      value: null,
      interval: null,
      kind: null,
      name: undefined,
      notDetermined: true,
    });
    expect(row.pKa1?.notDetermined).toBe(false);
  });

  it('when a profile could not be fitted, then its row has no estimates, counts its data and carries the error', () => {
    const [row] = parameterRows(
      [
        profileOf({
          fitData: { wells: [], pH: [4, 5, 6], v: [1, 2, 3] },
          selection: { requested: 'bell', model: 'bell', reason: '', candidates: [], tests: [] },
          error: { code: 'too_few_points', message: 'Too few pH points to fit a bell.' },
        }),
      ],
      false,
    );
    expect(row).toMatchObject({ model: null, n: 3, V: null, pKa1: null, optimum: null, requested: 'bell' });
    expect(row.error).toBe('Too few pH points to fit a bell.');
    expect(row.flags).toEqual([]);
  });

  it('when a profile has neither fit nor data, then its count is empty rather than zero', () => {
    expect(parameterRows([profileOf()], false)[0].n).toBeNull();
  });
});

describe('what the profile chart draws', () => {
  const plateNames = { p1: 'Plate 1' };
  const profile = profileOf({
    points: [
      point(5, {
        n: 2,
        mean: 40,
        sd: 2,
        wells: [
          { plateId: 'p1', well: 'A1' },
          { plateId: 'p1', well: 'A2' },
        ],
        excluded: [{ plateId: 'p1', well: 'A3', exclusionId: 'x1', reason: 'bubble' }],
      }),
      point(6, { wells: [{ plateId: 'p2', well: 'B1' }] }),
    ],
    fitData: {
      wells: [
        { plateId: 'p1', well: 'A1' },
        { plateId: 'p1', well: 'A2' },
        { plateId: 'p2', well: 'B1' },
      ],
      pH: [5, 5, 6],
      v: [38, 42, 70],
    },
    fit: { ...bellFit, residuals: [-0.5, 1.5, null], s2: 4 },
    relative: { maximum: 94, points: [], curve: { pH: [], v: [], lower: [], upper: [] } },
    curve: { pH: [4, 5, 6], v: [10, 40, 80], lower: [8, 38, 75], upper: [12, 42, 85] },
  });
  const wells = [
    wellRow('p1', 'A1', 38),
    wellRow('p1', 'A2', 42),
    wellRow('p1', 'A3', 90, { excluded: true, exclusion: { id: 'x1', reason: 'bubble' } }),
    wellRow('p2', 'B1', 70),
  ];
  const view = profileView(profile, wells, plateNames, false);

  it('when points have a mean, then they are drawn; a point without one is not', () => {
    expect(view.points).toEqual([{ pH: 5, mean: 40, sd: 2, n: 2 }]);
  });

  it('when wells are drawn singly, then excluded ones carry their reason and unnamed plates read "plate"', () => {
    expect(view.wells).toEqual([
      { pH: 5, value: 38, excluded: false, label: 'A1 (Plate 1)', note: null },
      { pH: 5, value: 42, excluded: false, label: 'A2 (Plate 1)', note: null },
      { pH: 5, value: 90, excluded: true, label: 'A3 (Plate 1)', note: 'bubble' },
      { pH: 6, value: 70, excluded: false, label: 'B1 (plate)', note: null },
    ]);
  });

  it('when a well has no activity or no row, then it is not drawn', () => {
    const v = profileView(profile, [wellRow('p1', 'A1', null)], plateNames, false);
    expect(v.wells).toEqual([]);
  });

  it('when a bell is fitted, then both apparent pKa values and the optimum are marked with the tables’ intervals', () => {
    expect(view.pKas).toEqual([
      { label: 'pKa1 5.02', value: 5.02, interval: [4.9, 5.15] },
      { label: 'pKa2 7.98', value: 7.98, interval: [7.9, 8.06] },
    ]);
    expect(view.optimum).toEqual({ label: 'optimum 6.50', value: 6.5, interval: [6.3, 6.7] });
    expect(profileView(profile, wells, plateNames, true).optimum?.interval).toEqual([6.4, 6.6]);
  });

  it('when the fit has a half-activity window, then it is drawn at half the fitted maximum', () => {
    expect(view.halfWindow).toEqual({ lo: 4.95, hi: 8.05, level: 47 });
  });

  it('when residuals are drawn, then each names its well and missing residuals are skipped', () => {
    expect(view.residuals).toEqual([
      { x: 5, residual: -0.5, label: 'A1 at pH 5: −0.500' },
      { x: 5, residual: 1.5, label: 'A2 at pH 5: 1.50' },
    ]);
    expect(view.s).toBe(2);
  });

  it('when the curve and band exist, then they are passed on; the log plot gets the bell’s three lines', () => {
    expect(view.curve).toEqual({ x: [4, 5, 6], y: [10, 40, 80], lower: [8, 38, 75], upper: [12, 42, 85] });
    expect(view.asymptotes.map((a) => a.slope)).toEqual([1, 0, -1]);
    expect(view.meetings.map((m) => m.label)).toEqual(['pKa1 5.02', 'pKa2 7.98']);
  });

  it('when one limb is fitted, then its single pKa is labelled "pKa" and there is no optimum', () => {
    const acid = profileView(
      profileOf({ fit: fitOf('acid', { V: estimate(10), pKa: estimate(6.25) }) }),
      [],
      plateNames,
      false,
    );
    expect(acid.pKas.map((m) => m.label)).toEqual(['pKa 6.25']);
    expect(acid.optimum).toBeNull();
    expect(acid.halfWindow).toBeNull();
  });

  it('when a pKa is not determined, then it is not marked', () => {
    const fit = fitOf('bell', { V: estimate(80), pKa1: estimate(5), pKa2: estimate(null) });
    expect(profileView(profileOf({ fit }), [], plateNames, false).pKas.map((m) => m.label)).toEqual([
      'pKa1 5.00',
    ]);
  });

  it('when there is no fit, then only the data are drawn', () => {
    const v = profileView({ ...profile, fit: null, curve: null }, wells, plateNames, false);
    expect(v).toMatchObject({
      curve: null,
      pKas: [],
      optimum: null,
      halfWindow: null,
      residuals: [],
      s: null,
    });
    expect(v.asymptotes).toEqual([]);
    expect(v.points).toHaveLength(1);
  });
});
