import { describe, expect, it } from 'vitest';
import { bufferPKas, designSeries, makeRecipe, type ChemResult, type SeriesInput } from '@shared/chemistry';

function value<T>(r: ChemResult<T>): T {
  if (!r.ok) throw new Error(`${r.error.code}: ${r.error.message}`);
  return r.value;
}

// Invented demo settings (PRODUCT.md demo scenario: a pH 2.5–8.0 profile at 37 °C); generated, not measured.
const demo: SeriesInput = {
  pHPoints: [8, 2.5, 3, 3.5, 4, 4.5, 5, 5.5, 6, 6.5, 7, 7.5],
  assayTemperatureC: 37,
  totalConc: 0.05,
  volume: 0.1,
};

describe('the buffer-series designer (PRODUCT.md workflow step 2)', () => {
  const series = value(designSeries(demo));

  it('sorts the points and proposes, for each, the system whose corrected pK″ is nearest (within one unit)', () => {
    expect(series.points.map((p) => p.pH)).toEqual([...demo.pHPoints].sort((a, b) => a - b));
    for (const point of series.points) {
      expect(point.proposal).not.toBeNull();
      expect(point.proposal!.distance).toBeLessThanOrEqual(1);
      // no other candidate is nearer (within the 0.02 that the I estimate may move pK″)
      for (const alt of point.alternatives)
        expect(alt.distance).toBeGreaterThanOrEqual(point.proposal!.distance - 0.02);
    }
  });

  it('gives a recipe at the assay temperature for every point, with its capacity', () => {
    for (const point of series.points) {
      expect(point.recipe!.temperatureC).toBe(37);
      expect(point.recipe!.targetPH).toBe(point.pH);
      expect(point.capacity).toBeGreaterThan(0);
    }
  });

  it('offers only library systems marked for the designer unless others are named', () => {
    const offered = new Set(
      series.points.flatMap((p) => [p.proposal!.systemId, ...p.alternatives.map((a) => a.systemId)]),
    );
    for (const id of ['cacodylate', 'carbonate', 'borate', 'potassium-phosphate', 'glycylglycine'])
      expect(offered.has(id)).toBe(false);
  });

  it('proposes overlap points where the system changes, with both buffers within one unit', () => {
    const overlaps = series.points.filter((p) => p.overlap);
    expect(overlaps.length).toBeGreaterThan(0);
    for (const p of overlaps) {
      expect(p.overlap!.systemId).not.toBe(p.proposal!.systemId);
      expect(Math.abs(p.overlap!.recipe.ionization.pKapp - p.pH)).toBeLessThanOrEqual(1.05);
    }
  });

  it('gives the pH to set at room temperature, and what setting the target there would give at 37 °C', () => {
    for (const point of series.points) {
      const makeUp = point.makeUp!;
      expect(makeUp.temperatureC).toBe(25);
      // the two corrections are mirror images to first order
      expect(makeUp.setPH - point.pH).toBeCloseTo(point.pH - makeUp.naiveAssayPH!, 1);
    }
  });

  it('matches the Tris example: made to pH 8.00 at 25 °C, a 50 mM Tris buffer reads 7.68 at 37 °C (SCIENCE.md §2.6)', () => {
    const tris = value(designSeries({ ...demo, pHPoints: [8], systems: ['tris'] }));
    expect(tris.points[0].makeUp!.naiveAssayPH).toBeCloseTo(7.682, 2);
    expect(tris.cautions.join(' ')).toMatch(/Tris: large dpKa\/dT/);
  });

  it('flags weak capacity when β falls below half its peak', () => {
    // Tris pK″ ≈ 7.82 at 37 °C: pH 8.65 is 0.83 above it, where 4α(1 − α) ≈ 0.45
    const s = value(designSeries({ ...demo, pHPoints: [8.65], systems: ['tris'] }));
    const p = s.points[0];
    expect(p.relativeCapacity).toBeLessThan(0.5);
    expect(p.weak).toBe(true);
    expect(p.warnings.join(' ')).toMatch(/Weak capacity/);
  });

  it('says when no system lies within one unit', () => {
    const s = value(designSeries({ ...demo, pHPoints: [4.5], systems: ['hepes'] }));
    expect(s.points[0].proposal).toBeNull();
    expect(s.points[0].weak).toBe(true);
    expect(s.points[0].warnings.join(' ')).toMatch(/No buffer/);
  });

  it('reports the ionic-strength spread and suggests topping up with salt; a target removes the spread', () => {
    expect(series.ionicStrengthRange![1]).toBeGreaterThan(series.ionicStrengthRange![0]);
    expect(series.cautions.join(' ')).toMatch(/Ionic strength varies/);
    const fixed = value(designSeries({ ...demo, pHPoints: [6, 7, 7.5], targetIonicStrength: 0.2 }));
    expect(fixed.ionicStrengthRange![0]).toBeCloseTo(0.2, 9);
    expect(fixed.ionicStrengthRange![1]).toBeCloseTo(0.2, 9);
  });

  it('predicts the well pH after enzyme and substrate and warns when it drifts more than 0.05', () => {
    const enzyme = value(
      makeRecipe({ system: 'tris', pH: 8.5, temperatureC: 37, totalConc: 0.05, volume: 0.01 }),
    );
    const well = {
      bufferVolume: 150e-6,
      additions: [
        { label: 'enzyme stock (invented)', composition: enzyme.composition, volume: 40e-6 },
        { label: 'substrate in water', composition: { buffers: [], ions: {} }, volume: 10e-6 },
      ],
    };
    const s = value(designSeries({ ...demo, pHPoints: [5.5, 7.5], totalConc: 0.01, well }));
    for (const p of s.points) {
      expect(p.well).not.toBeNull();
      expect(p.well!.drift).toBeCloseTo(p.well!.pH - p.pH, 12);
      expect(p.well!.drift).toBeGreaterThan(0); // a basic stock pushes the pH up
      const warned = p.warnings.some((w) => /drift/.test(w));
      expect(warned).toBe(Math.abs(p.well!.drift) > 0.05);
    }
    expect(s.points.some((p) => Math.abs(p.well!.drift) > 0.05)).toBe(true);
  });

  it('uses lab-added systems passed in the library', () => {
    const lab = {
      id: 'lab-acid',
      name: 'Lab acid (invented check data)',
      ionizations: [
        {
          label: 'pKa',
          pKa25: 5.2,
          zAcid: 0,
          dH: 0,
          usefulRange: [4.2, 6.2],
          sources: { row: 'lab', pKa25: 'lab' },
          titration: { startFormId: 'free', titrant: 'NaOH' },
        },
      ],
      forms: [{ id: 'free', name: 'Free acid', formula: 'C4H6O4', formulaWeight: 118.09 }],
    };
    const s = value(
      designSeries({ ...demo, pHPoints: [5.2], systems: ['lab-acid'], library: [lab as never] }),
    );
    expect(s.points[0].proposal!.systemId).toBe('lab-acid');
    const pk = value(bufferPKas({ system: 'lab-acid', temperatureC: 37, library: [lab as never] }));
    expect(pk.steps[0].pKa).toBeCloseTo(5.2, 12); // ΔH = 0: no temperature change (van 't Hoff)
  });

  it('refuses bad input with typed errors', () => {
    expect(designSeries({ ...demo, pHPoints: [] })).toMatchObject({
      ok: false,
      error: { code: 'invalid-input' },
    });
    expect(designSeries({ ...demo, pHPoints: [15] })).toMatchObject({
      ok: false,
      error: { code: 'ph-out-of-range' },
    });
    expect(designSeries({ ...demo, assayTemperatureC: 120 })).toMatchObject({
      ok: false,
      error: { code: 'temperature-out-of-range' },
    });
    expect(designSeries({ ...demo, totalConc: -1 })).toMatchObject({
      ok: false,
      error: { code: 'negative-concentration' },
    });
    expect(designSeries({ ...demo, systems: ['nope'] })).toMatchObject({
      ok: false,
      error: { code: 'unknown-buffer' },
    });
  });
});
