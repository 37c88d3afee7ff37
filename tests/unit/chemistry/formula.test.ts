import { describe, expect, it } from 'vitest';
import { bufferLibrary, molarMass } from '@shared/chemistry';
import { formulaWeight, parseFormula } from '@shared/chemistry/formula';

describe('formula weights from atomic weights', () => {
  it('Tris 121.135 and Tris·HCl 157.596 g/mol (Harris, Quantitative Chemical Analysis [memory], via SCIENCE.md §2.4)', () => {
    // older atomic weights there: agreement to 0.003 g/mol
    expect(Math.abs(formulaWeight('C4H11NO3') - 121.135)).toBeLessThan(0.003);
    expect(Math.abs(formulaWeight('C4H11NO3·HCl') - 157.596)).toBeLessThan(0.003);
  });

  it('reads hydrates, fractional water and parentheses', () => {
    expect(parseFormula('Na2HPO4·7H2O')).toEqual({ Na: 2, H: 15, P: 1, O: 11 });
    expect(parseFormula('C6H6Na2O7·1.5H2O')).toEqual({ C: 6, H: 9, Na: 2, O: 8.5 });
    expect(parseFormula('(CH3)2AsO2Na')).toEqual({ C: 2, H: 6, As: 1, O: 2, Na: 1 });
  });

  it('NaCl 58.44 and KCl 74.55 g/mol (common practice, no source)', () => {
    expect(formulaWeight('NaCl')).toBeCloseTo(58.44, 2);
    expect(formulaWeight('KCl')).toBeCloseTo(74.55, 2);
  });

  it('every form in the library carries the weight computed from its formula', () => {
    for (const system of bufferLibrary) {
      for (const form of system.forms) expect(form.formulaWeight).toBeCloseTo(formulaWeight(form.formula), 3);
    }
  });

  it('bad formulas give typed errors, never throws', () => {
    expect(molarMass('Xx2O')).toMatchObject({ ok: false, error: { code: 'invalid-input' } });
    expect(molarMass('C6H12O6)')).toMatchObject({ ok: false });
    expect(molarMass('')).toMatchObject({ ok: false });
    expect(molarMass('H2O')).toMatchObject({ ok: true, value: { molarMass: expect.closeTo(18.015, 3) } });
  });
});
