// The pure core of the buffer-series designer (PRODUCT.md workflow step 2). For each pH point it
// proposes the system whose temperature- and ionic-strength-corrected pK″ is nearest (within one
// unit), gives the recipe at the assay temperature, the capacity, a weak-capacity flag, overlap
// points where the proposed system changes, the pH to set when the buffer is made at room
// temperature, and the well pH after enzyme and substrate are added.
import { apparentPKa } from './activity';
import { environment, prepare, solveState, systemPKas } from './equilibrium';
import { bufferLibrary, type BufferSystem, type Salt } from './library';
import { mixComposition, type MixPart } from './mixing';
import { computeRecipe, type Recipe, type RecipeMethod } from './recipe';
import { LARGE_DPKA_DT, SAFETY_CAUTION } from './recipe-steps';
import { ChemFailure, guardInput, type ChemResult } from './result';
import type { ActivityModel } from './activity';
import { resolveComposition, resolveLibrary, resolveSystem } from './solution';
import { checkAmount, checkPH, checkRange, checkTemperature } from './validate';

export interface SeriesInput {
  pHPoints: number[];
  assayTemperatureC: number;
  /** Where the buffers are made up and their pH set; default 25 °C (room temperature). */
  makeTemperatureC?: number;
  /** mol/L of buffer at every point. */
  totalConc: number;
  /** Volume of each recipe, L. */
  volume: number;
  targetIonicStrength?: number;
  salt?: Salt;
  /** Candidate system ids; default: every library system marked for the designer. */
  systems?: string[];
  library?: readonly BufferSystem[];
  method?: RecipeMethod;
  activityModel?: ActivityModel;
  /** Propose overlap points (two buffers at one pH) where the system changes; default true. */
  overlap?: boolean;
  /** A point is weak when the buffer's β is below this fraction of its peak ln10·C/4; default 0.5. */
  weakRelativeCapacity?: number;
  /** The well: buffer volume (L) plus additions such as enzyme stock and substrate solution. */
  well?: { bufferVolume: number; additions: MixPart[] };
  /** Warn when the well pH drifts from the point by more than this; default 0.05. */
  driftLimit?: number;
}

export interface Candidate {
  systemId: string;
  systemName: string;
  step: number;
  pKapp: number;
  distance: number;
}

export interface SeriesPoint {
  pH: number;
  proposal: Candidate | null;
  alternatives: Candidate[];
  recipe: Recipe | null;
  capacity: number | null;
  relativeCapacity: number | null;
  weak: boolean;
  overlap: { systemId: string; systemName: string; recipe: Recipe; capacity: number } | null;
  /** Made at the make-up temperature: the pH to set there, and what a naive set-to-target gives. */
  makeUp: { temperatureC: number; setPH: number; naiveAssayPH: number | null } | null;
  well: { pH: number; drift: number } | null;
  warnings: string[];
}

export interface Series {
  assayTemperatureC: number;
  makeTemperatureC: number;
  points: SeriesPoint[];
  ionicStrengthRange: [number, number] | null;
  cautions: string[];
  warnings: string[];
}

export function designSeries(input: SeriesInput): ChemResult<Series> {
  return guardInput(input, () => design(input));
}

function design(input: SeriesInput): Series {
  if (!Array.isArray(input.pHPoints) || input.pHPoints.length === 0) {
    throw new ChemFailure('invalid-input', 'Give at least one pH point.');
  }
  if (input.pHPoints.length > 384) throw new ChemFailure('invalid-input', 'At most 384 pH points.');
  const points = input.pHPoints.map((p) => checkPH(p, 'pH point')).sort((a, b) => a - b);
  const assayT = checkTemperature(input.assayTemperatureC, 'Assay temperature');
  const makeT = checkTemperature(input.makeTemperatureC ?? 25, 'Make-up temperature');
  const C = checkAmount(input.totalConc, 'Buffer concentration', true);
  checkAmount(input.volume, 'Volume', true);
  const weakBelow = checkRange(input.weakRelativeCapacity ?? 0.5, 'Weak-capacity fraction', 0, 1);
  const driftLimit = checkAmount(input.driftLimit ?? 0.05, 'Drift limit');
  if (
    input.well !== undefined &&
    (typeof input.well !== 'object' || input.well === null || !Array.isArray(input.well.additions))
  ) {
    throw new ChemFailure('invalid-input', 'The well needs a buffer volume and a list of additions.');
  }
  const library = resolveLibrary(input.library);
  const systems = input.systems
    ? (Array.isArray(input.systems) ? input.systems : [input.systems]).map((id) => resolveSystem(id, library))
    : [...library, ...bufferLibrary.filter((s) => s.designerDefault)];
  const env = environment({ temperatureC: assayT, activityModel: input.activityModel, library });
  const Iguess = input.targetIonicStrength ?? C / 2;
  const stepTable = systems.flatMap((system) => {
    const pKa = systemPKas(system, env);
    return pKa.map((p, step) => ({
      systemId: system.id,
      systemName: system.name,
      step,
      pKapp: apparentPKa(p, system.ionizations[step].zAcid, Iguess, assayT, env.model),
    }));
  });
  const designed = points.map((pH) =>
    designPoint(pH, stepTable, { input, assayT, makeT, C, weakBelow, driftLimit, library }),
  );
  if (input.overlap ?? true)
    addOverlaps(designed, { input, assayT, makeT, C, weakBelow, driftLimit, library });
  const Is = designed.flatMap((p) => (p.recipe ? [p.recipe.ionicStrength] : []));
  const range: [number, number] | null = Is.length ? [Math.min(...Is), Math.max(...Is)] : null;
  const cautions = seriesCautions(designed, systems, assayT, makeT, range, input.targetIonicStrength);
  return {
    assayTemperatureC: assayT,
    makeTemperatureC: makeT,
    points: designed,
    ionicStrengthRange: range,
    cautions,
    warnings: [...env.warnings],
  };
}

interface Ctx {
  input: SeriesInput;
  assayT: number;
  makeT: number;
  C: number;
  weakBelow: number;
  driftLimit: number;
  library: readonly BufferSystem[];
}

type StepRow = Omit<Candidate, 'distance'>;

/** The estimated pK″ may differ from a recipe's own by a few tenths (citrate at high I). */
const SCREEN_WINDOW = 1.4;

function candidatesAt(pH: number, table: StepRow[], window = 1): Candidate[] {
  return table
    .map((row) => ({ ...row, distance: Math.abs(pH - row.pKapp) }))
    .filter((c) => c.distance <= window)
    .sort((a, b) => a.distance - b.distance);
}

function recipeFor(pH: number, c: Candidate, ctx: Ctx): Recipe {
  return computeRecipe({
    system: c.systemId,
    pH,
    temperatureC: ctx.assayT,
    totalConc: ctx.C,
    volume: ctx.input.volume,
    method: ctx.input.method,
    ionization: c.step,
    salt: ctx.input.salt,
    targetIonicStrength: ctx.input.targetIonicStrength,
    activityModel: ctx.input.activityModel,
    library: ctx.library,
  });
}

function designPoint(pH: number, table: StepRow[], ctx: Ctx): SeriesPoint {
  const point: SeriesPoint = {
    pH,
    proposal: null,
    alternatives: [],
    recipe: null,
    capacity: null,
    relativeCapacity: null,
    weak: true,
    overlap: null,
    makeUp: null,
    well: null,
    warnings: [],
  };
  // Screen with the estimated I, then rank by the pK″ of each candidate's own recipe (its I).
  const failures: string[] = [];
  const made = candidatesAt(pH, table, SCREEN_WINDOW).flatMap((c) => {
    try {
      const recipe = recipeFor(pH, c, ctx);
      const pKapp = recipe.ionization.pKapp;
      return [{ candidate: { ...c, pKapp, distance: Math.abs(pH - pKapp) }, recipe }];
    } catch (error) {
      if (!(error instanceof ChemFailure)) throw error;
      failures.push(`${c.systemName}: ${error.message}`);
      return [];
    }
  });
  const ranked = made
    .filter((m) => m.candidate.distance <= 1)
    .sort((a, b) => a.candidate.distance - b.candidate.distance);
  // One entry per system (its nearest step), so alternatives name distinct buffers.
  const seen = new Set<string>();
  const distinct = ranked.filter((m) => !seen.has(m.candidate.systemId) && seen.add(m.candidate.systemId));
  if (distinct.length === 0) {
    point.warnings.push(
      `No buffer among the candidates has a pK″ within one unit of pH ${pH} at ${ctx.assayT} °C.`,
      ...failures,
    );
    return point;
  }
  point.proposal = distinct[0].candidate;
  point.recipe = distinct[0].recipe;
  point.alternatives = distinct.slice(1).map((m) => m.candidate);
  const r = point.recipe;
  point.capacity = r.capacity.total;
  point.relativeCapacity = r.capacity.buffer / ((Math.LN10 * ctx.C) / 4);
  point.weak = point.relativeCapacity < ctx.weakBelow;
  if (point.weak) {
    point.warnings.push(
      `Weak capacity: β is ${(100 * point.relativeCapacity).toFixed(0)} % of its peak at pH ${pH}.`,
    );
  }
  point.makeUp = makeUpAt(pH, point.proposal, r, ctx);
  point.well = wellPH(r, ctx);
  if (point.well && Math.abs(point.well.drift) > ctx.driftLimit) {
    point.warnings.push(
      `The well reads pH ${point.well.pH.toFixed(2)} after the additions (drift ${point.well.drift.toFixed(3)}, more than ${ctx.driftLimit}).`,
    );
  }
  point.warnings.push(...r.warnings);
  return point;
}

function makeUpAt(pH: number, c: Candidate, r: Recipe, ctx: Ctx): SeriesPoint['makeUp'] {
  const make = environment({
    temperatureC: ctx.makeT,
    activityModel: ctx.input.activityModel,
    library: ctx.library,
  });
  const setPH = solveState(prepare(r.composition, make)).pH;
  let naiveAssayPH: number | null = null;
  try {
    const naive = computeRecipe({
      system: c.systemId,
      pH,
      temperatureC: ctx.makeT,
      totalConc: ctx.C,
      volume: ctx.input.volume,
      method: ctx.input.method,
      ionization: c.step,
      salt: ctx.input.salt,
      targetIonicStrength: ctx.input.targetIonicStrength,
      activityModel: ctx.input.activityModel,
      library: ctx.library,
    });
    const assay = environment({
      temperatureC: ctx.assayT,
      activityModel: ctx.input.activityModel,
      library: ctx.library,
    });
    naiveAssayPH = solveState(prepare(naive.composition, assay)).pH;
  } catch (error) {
    if (!(error instanceof ChemFailure)) throw error;
  }
  return { temperatureC: ctx.makeT, setPH, naiveAssayPH };
}

function wellPH(r: Recipe, ctx: Ctx): SeriesPoint['well'] {
  const well = ctx.input.well;
  if (!well) return null;
  const env = environment({
    temperatureC: ctx.assayT,
    activityModel: ctx.input.activityModel,
    library: ctx.library,
  });
  for (const part of well.additions) resolveComposition(part.composition, env.library);
  const { composition } = mixComposition([
    { label: 'buffer', composition: r.composition, volume: well.bufferVolume },
    ...well.additions,
  ]);
  const pH = solveState(prepare(composition, env)).pH;
  return { pH, drift: pH - r.targetPH };
}

function addOverlaps(points: SeriesPoint[], ctx: Ctx): void {
  for (let i = 0; i + 1 < points.length; i++) {
    const a = points[i];
    const b = points[i + 1];
    if (!a.proposal || !b.proposal || a.proposal.systemId === b.proposal.systemId) continue;
    const tryOverlap = (at: SeriesPoint, other: Candidate): boolean => {
      if (at.overlap) return false;
      // the other system must itself be a candidate here: its own recipe within one unit
      const c = at.alternatives.find((x) => x.systemId === other.systemId);
      if (!c) return false;
      try {
        const recipe = recipeFor(at.pH, c, ctx);
        at.overlap = {
          systemId: c.systemId,
          systemName: c.systemName,
          recipe,
          capacity: recipe.capacity.total,
        };
        return true;
      } catch (error) {
        if (error instanceof ChemFailure) return false;
        throw error;
      }
    };
    if (!tryOverlap(a, b.proposal) && !tryOverlap(b, a.proposal)) {
      a.warnings.push(
        `No overlap point between ${a.proposal.systemName} and ${b.proposal.systemName}: add a pH point between ${a.pH} and ${b.pH} that both can buffer.`,
      );
    }
  }
}

function seriesCautions(
  points: SeriesPoint[],
  systems: BufferSystem[],
  assayT: number,
  makeT: number,
  range: [number, number] | null,
  targetI: number | undefined,
): string[] {
  const cautions = new Set<string>();
  const used = points.flatMap((p) => [
    ...(p.recipe ? [{ id: p.recipe.systemId, step: p.recipe.ionization.index }] : []),
    ...(p.overlap ? [{ id: p.overlap.systemId, step: p.overlap.recipe.ionization.index }] : []),
  ]);
  for (const system of systems) {
    const steps = used.filter((u) => u.id === system.id).map((u) => u.step);
    if (steps.length === 0) continue;
    for (const c of system.cautions) cautions.add(`${system.name}: ${c}`);
    const steep = steps.some((k) => Math.abs(system.ionizations[k].dpKadT ?? 0) >= LARGE_DPKA_DT);
    if (steep && assayT !== makeT) {
      cautions.add(
        `${system.name}: large dpKa/dT; set its pH at ${assayT} °C, or to the set point given for ${makeT} °C.`,
      );
    }
  }
  if (range && targetI === undefined && range[1] - range[0] > 0.01) {
    cautions.add(
      `Ionic strength varies from ${range[0].toFixed(3)} to ${range[1].toFixed(3)} M along the series: top up with salt to one value (e.g. ${range[1].toFixed(3)} M).`,
    );
  }
  cautions.add(SAFETY_CAUTION);
  return [...cautions];
}
