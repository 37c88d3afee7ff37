// What a solution contains, as totals that do not change with temperature or pH: buffer systems
// (total concentration over all protonation states) and strong ions (counter-ions, titrant ions,
// added salt). All concentrations in mol/L. A composition is plain JSON, so a recipe's result can
// be fed to mixing, titration and temperature-shift calculations.
import { bufferSystemSchema, findBufferSystem, type BufferSystem } from './library';
import { ChemFailure } from './result';
import { checkAmount, shown } from './validate';

export const STRONG_ION_CHARGE = { Na: 1, K: 1, Cl: -1, Mg: 2, Ca: 2, SO4: -2, NO3: -1 } as const;
export type StrongIon = keyof typeof STRONG_ION_CHARGE;

export interface Composition {
  buffers: { systemId: string; total: number }[];
  ions: Partial<Record<StrongIon, number>>;
}

export const emptyComposition = (): Composition => ({ buffers: [], ions: {} });

export interface ResolvedBuffer {
  system: BufferSystem;
  total: number;
}

const checked = new WeakMap<object, BufferSystem>();

/** A library system by name, or an inline (lab-added) system, validated once with the schema. */
export function resolveSystem(
  ref: string | BufferSystem,
  library: readonly BufferSystem[] = [],
): BufferSystem {
  if (typeof ref === 'object' && ref !== null) {
    const known = checked.get(ref);
    if (known) return known;
    const parsed = bufferSystemSchema.safeParse(ref);
    if (!parsed.success) {
      throw new ChemFailure(
        'invalid-input',
        'The buffer system given inline is not valid (see bufferSystemSchema).',
      );
    }
    // defaults filled in; the parsed copy is cached for this object
    checked.set(ref, parsed.data);
    return parsed.data;
  }
  if (typeof ref !== 'string') throw new ChemFailure('invalid-input', 'Name a buffer system (e.g. "hepes").');
  const system = findBufferSystem(ref, library);
  if (!system) {
    throw new ChemFailure(
      'unknown-buffer',
      `Unknown buffer system "${ref}". List them with "bellwether buffer list".`,
    );
  }
  return system;
}

export function resolveComposition(c: Composition, library: readonly BufferSystem[] = []): ResolvedBuffer[] {
  if (!c || !Array.isArray(c.buffers) || typeof c.ions !== 'object' || c.ions === null) {
    throw new ChemFailure('invalid-input', 'A solution needs "buffers" (a list) and "ions" (an object).');
  }
  for (const [ion, conc] of Object.entries(c.ions)) {
    if (!Object.hasOwn(STRONG_ION_CHARGE, ion)) {
      throw new ChemFailure(
        'invalid-input',
        `Unknown ion "${ion}"; use ${Object.keys(STRONG_ION_CHARGE).join(', ')}.`,
      );
    }
    checkAmount(conc, `Concentration of ${ion}`);
  }
  return c.buffers.map((b) => {
    if (typeof b !== 'object' || b === null)
      throw new ChemFailure('invalid-input', 'Each buffer needs a systemId and a total.');
    return {
      system: resolveSystem(b.systemId, library),
      total: checkAmount(b.total, `Concentration of ${shown(b.systemId)}`),
    };
  });
}

/** Σ c·z and ½ Σ c·z² of the strong ions. */
export function strongIonSums(ions: Composition['ions']): { charge: number; halfSquares: number } {
  let charge = 0;
  let squares = 0;
  for (const [ion, conc] of Object.entries(ions)) {
    const z = STRONG_ION_CHARGE[ion as StrongIon];
    charge += (conc ?? 0) * z;
    squares += (conc ?? 0) * z * z;
  }
  return { charge, halfSquares: squares / 2 };
}

/** Adds `b` to `a`, scaled: used for mixing volumes and adding reagents. */
export function combine(parts: { composition: Composition; factor: number }[]): Composition {
  const buffers = new Map<string, number>();
  const ions: Partial<Record<StrongIon, number>> = {};
  for (const { composition, factor } of parts) {
    for (const b of composition.buffers)
      buffers.set(b.systemId, (buffers.get(b.systemId) ?? 0) + b.total * factor);
    for (const [ion, conc] of Object.entries(composition.ions)) {
      const key = ion as StrongIon;
      ions[key] = (ions[key] ?? 0) + (conc ?? 0) * factor;
    }
  }
  return { buffers: [...buffers].map(([systemId, total]) => ({ systemId, total })), ions };
}

/** Lab-added systems given with a calculation, validated (and their defaults filled in). */
export function resolveLibrary(library: unknown): BufferSystem[] {
  if (library === undefined) return [];
  if (!Array.isArray(library))
    throw new ChemFailure('invalid-input', 'The extra library must be a list of buffer systems.');
  return library.map((system) => {
    if (typeof system !== 'object' || system === null) {
      throw new ChemFailure('invalid-input', 'Each entry of the extra library must be a buffer system.');
    }
    return resolveSystem(system as BufferSystem);
  });
}
