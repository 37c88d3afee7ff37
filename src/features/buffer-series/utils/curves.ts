// Curves computed in the browser with shared/chemistry (the same code the server designs with):
// β against pH for the systems a series uses, and the titration curve of one recipe.
import { capacityCurve, titrationCurve, type BufferSystem, type Recipe } from '@shared/chemistry';
import type { DesignedSeries, SeriesRequest } from '@shared/schemas/buffer-series';

export type CurvePoint = { x: number; y: number };
export type SystemCurve = { systemId: string; systemName: string; points: CurvePoint[] };

/**
 * β (mM/pH) of each proposed system across the points it serves (± 0.5 pH), each pH a buffer made
 * up there (Van Slyke with water's terms, shared/chemistry capacity.ts).
 */
export function capacityCurves(
  design: DesignedSeries,
  request: Pick<SeriesRequest, 'bufferConcMm' | 'targetIonicStrengthM' | 'method'>,
  library: readonly BufferSystem[],
): SystemCurve[] {
  const spans = new Map<string, { name: string; from: number; to: number }>();
  for (const p of design.points) {
    if (!p.proposal) continue;
    const span = spans.get(p.proposal.systemId);
    spans.set(p.proposal.systemId, {
      name: p.proposal.systemName,
      from: Math.min(span?.from ?? p.pH, p.pH),
      to: Math.max(span?.to ?? p.pH, p.pH),
    });
  }
  return [...spans.entries()].flatMap(([systemId, s]) => {
    const result = capacityCurve({
      system: systemId,
      pHFrom: Math.max(0, Math.round((s.from - 0.5) * 20) / 20),
      pHTo: Math.min(14, Math.round((s.to + 0.5) * 20) / 20),
      step: 0.05,
      temperatureC: design.assayTemperatureC,
      totalConc: request.bufferConcMm / 1000,
      ionicStrength: request.targetIonicStrengthM ?? undefined,
      method: request.method,
      library,
    });
    if (!result.ok) return [];
    return [
      { systemId, systemName: s.name, points: result.value.map((c) => ({ x: c.pH, y: c.capacity * 1000 })) },
    ];
  });
}

/**
 * The recipe's response to strong acid (negative x) and strong base (positive x), in mmol per
 * litre of buffer, from its own composition; dilution by the titrant is neglected.
 */
export function titrationOf(
  recipe: Recipe,
  library: readonly BufferSystem[],
): { ok: true; points: CurvePoint[] } | { ok: false; message: string } {
  const common = {
    composition: recipe.composition,
    volume: 1,
    maxAmount: recipe.totalConc,
    steps: 50,
    temperatureC: recipe.temperatureC,
    library,
  };
  const acid = titrationCurve({ ...common, titrant: 'HCl' });
  const base = titrationCurve({ ...common, titrant: 'NaOH' });
  if (!acid.ok) return { ok: false, message: acid.error.message };
  if (!base.ok) return { ok: false, message: base.error.message };
  return {
    ok: true,
    points: [
      ...acid.value
        .slice(1)
        .reverse()
        .map((t) => ({ x: -t.amount * 1000, y: t.pH })),
      ...base.value.map((t) => ({ x: t.amount * 1000, y: t.pH })),
    ],
  };
}
