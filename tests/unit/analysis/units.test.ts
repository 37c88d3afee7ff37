// The units rule (units.ts): specific activity only when every variant has a protein concentration and
// the enzyme volume is set; otherwise the volumetric rate, product, or signal — and the note says why.
// Studies are GENERATED (make-study.ts, invented data).
import { describe, expect, it } from 'vitest';
import { planUnits, type AnalysisInput } from '../../../shared/analysis';
import { makeStudy } from '../../fixtures/analysis/make-study';

const kinetic = (): AnalysisInput => makeStudy({ seed: 1, reads: 6 }).input;

describe('planUnits', () => {
  it('gives specific activity when every variant has a protein concentration and the enzyme volume is set', () => {
    expect(planUnits(kinetic(), false).units).toMatchObject({
      signal: 'A/min',
      rate: 'µM/min',
      activity: 'µmol min⁻¹ mg⁻¹',
      activityKind: 'specific',
    });
  });

  it('falls back to the volumetric rate, naming the variants without protein', () => {
    const input = kinetic();
    input.variants[2].proteinMgPerMl = null;
    const u = planUnits(input, false).units;
    expect(u).toMatchObject({
      activity: 'µM/min',
      activityKind: 'volumetric',
      activityLabel: 'Volumetric rate',
    });
    expect(u.note).toContain(input.variants[2].name);
  });

  it('falls back to the volumetric rate without an enzyme volume', () => {
    const input = kinetic();
    input.settings.enzymeVolumeUl = null;
    expect(planUnits(input, false).units.note).toMatch(/enzyme volume/);
  });

  it('stays in signal units when there is no path length, and says what to give', () => {
    const input = kinetic();
    input.assay.pathLengthCm = null;
    const plan = planUnits(input, false);
    expect(plan.conversion).toBeNull();
    expect(plan.units).toMatchObject({ rate: 'A/min', activity: 'A/min', activityKind: 'signal' });
    expect(plan.units.note).toMatch(/path length/);
  });

  it('refuses an extinction coefficient for fluorescence, and names the wavelength when known', () => {
    const input = kinetic();
    input.assay.detection = 'fluorescence';
    expect(planUnits(input, false).units).toMatchObject({ signal: 'RFU/min', activityKind: 'signal' });
    input.assay.detection = 'absorbance';
    input.assay.wavelengthNm = 405;
    expect(planUnits(input, false).units.signal).toBe('A405/min');
  });

  it('uses a standard curve when one exists, and µM for end points without a reaction time', () => {
    const input = makeStudy({ seed: 1, readMode: 'endpoint', quantitation: 'standard-curve' }).input;
    expect(planUnits(input, false).units.activityKind).toBe('signal');
    expect(planUnits(input, true).units).toMatchObject({
      signal: 'A',
      rate: 'µM',
      activity: 'µM',
      activityKind: 'product',
    });
    input.settings.reactionTimeMin = 15;
    expect(planUnits(input, true).units).toMatchObject({ rate: 'µM/min', activityKind: 'specific' });
  });
});
