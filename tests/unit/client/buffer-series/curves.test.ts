import { describe, expect, it } from 'vitest';
import { bufferLibrary, makeRecipe, type Recipe } from '@shared/chemistry';
import type { SeriesPoint } from '@shared/chemistry/series';
import type { DesignedSeries } from '@shared/schemas/buffer-series';
import { capacityCurves, titrationOf } from '@/features/buffer-series/utils/curves';

const proposed = (pH: number, systemId: string | null): SeriesPoint => ({
  pH,
  proposal: systemId
    ? { systemId, systemName: systemId.toUpperCase(), step: 0, pKapp: pH, distance: 0 }
    : null,
  alternatives: [],
  recipe: null,
  capacity: null,
  relativeCapacity: null,
  weak: false,
  overlap: null,
  makeUp: null,
  well: null,
  warnings: [],
});

const design = (points: SeriesPoint[]): DesignedSeries => ({
  assayTemperatureC: 25,
  makeTemperatureC: 25,
  points,
  ionicStrengthRange: null,
  cautions: [],
  warnings: [],
  overridden: [],
});
const request = { bufferConcMm: 50, targetIonicStrengthM: null, method: 'titrate' as const };

describe('buffer capacity curves of a series', () => {
  const curves = capacityCurves(
    design([
      proposed(5.5, 'mes'),
      proposed(6, 'mes'),
      proposed(6.5, 'mes'),
      proposed(7.5, 'hepes'),
      proposed(9, null),
    ]),
    request,
    bufferLibrary,
  );

  it('when points are proposed with systems, then each system has one curve over its points ± 0.5 pH in 0.05 steps', () => {
    expect(curves.map((c) => c.systemId)).toEqual(['mes', 'hepes']);
    const mes = curves[0].points;
    expect(mes[0].x).toBeCloseTo(5, 9);
    expect(mes.at(-1)?.x).toBeCloseTo(7, 9);
    expect(mes).toHaveLength(41);
    expect(mes[1].x - mes[0].x).toBeCloseTo(0.05, 9);
    const hepes = curves[1].points;
    expect(hepes[0].x).toBeCloseTo(7, 9);
    expect(hepes.at(-1)?.x).toBeCloseTo(8, 9);
    expect(curves[1].systemName).toBe('HEPES');
  });

  it('when β is drawn, then it is in mM/pH and peaks near ln10·C/4 (Van Slyke 1922, SCIENCE.md §2.3)', () => {
    // C = 50 mM: ln10 × 50 / 4 = 28.78 mM/pH; water's own terms are negligible near pH 6.
    const peak = Math.max(...curves[0].points.map((p) => p.y));
    expect(peak).toBeGreaterThan(28.5);
    expect(peak).toBeLessThan(29.1);
    // One pH unit from the pKa, β is well below its peak.
    expect(curves[0].points[0].y).toBeLessThan(peak / 2);
  });

  it('when a point lies near pH 0 or 14, then the curve stops at the end of the pH scale', () => {
    const [naoh] = capacityCurves(design([proposed(13.8, 'caps')]), request, bufferLibrary);
    expect(naoh.points.at(-1)?.x).toBeLessThanOrEqual(14);
  });

  it('when no point has a proposal, or a system is not in the library, then there is no curve', () => {
    expect(capacityCurves(design([proposed(7, null)]), request, bufferLibrary)).toEqual([]);
    expect(capacityCurves(design([proposed(7, 'no-such-buffer')]), request, bufferLibrary)).toEqual([]);
  });
});

describe('the titration curve of one recipe', () => {
  const made = makeRecipe({ system: 'mes', pH: 6, temperatureC: 25, totalConc: 0.05, volume: 1 });
  if (!made.ok) throw new Error(made.error.message);
  const recipe: Recipe = made.value;
  const curve = titrationOf(recipe, bufferLibrary);

  it('when acid and base are added, then x runs from −C to +C in mmol/L with the recipe itself once at 0', () => {
    if (!curve.ok) throw new Error(curve.message);
    const xs = curve.points.map((p) => p.x);
    expect(xs[0]).toBeCloseTo(-50, 6);
    expect(xs.at(-1)).toBeCloseTo(50, 6);
    expect(xs.filter((x) => x === 0)).toHaveLength(1);
    for (let i = 1; i < xs.length; i++) expect(xs[i]).toBeGreaterThan(xs[i - 1]);
  });

  it('when base is added the pH rises and acid lowers it, and at no titrant it is the recipe’s pH', () => {
    if (!curve.ok) throw new Error(curve.message);
    const ys = curve.points.map((p) => p.y);
    for (let i = 1; i < ys.length; i++) expect(ys[i]).toBeGreaterThan(ys[i - 1]);
    const zero = curve.points.find((p) => p.x === 0);
    expect(zero?.y).toBeCloseTo(6, 2);
  });

  it('when the recipe names a system the library lacks, then the curve is refused with a message', () => {
    const broken = titrationOf(
      { ...recipe, composition: { buffers: [{ systemId: 'nope', total: 0.05 }], ions: {} } },
      bufferLibrary,
    );
    expect(broken.ok).toBe(false);
    if (!broken.ok) expect(broken.message.length).toBeGreaterThan(5);
  });
});
