// Assays: how activity is read. The refinements say what a real assay needs (a wavelength for
// absorbance, an extinction coefficient or a standard curve, a path length or a well volume).
import { z } from 'zod';
import { idSchema, optionalText, text } from './common';

export const readModes = ['endpoint', 'kinetic'] as const;
export const detections = ['absorbance', 'fluorescence'] as const;
export const quantitations = ['extinction', 'standard-curve'] as const;
export const extinctionUnits = ['M-1cm-1', 'mM-1cm-1'] as const;
export const substrateRegimes = ['saturating', 'sub-saturating', 'unknown'] as const;

const positive = (label: string, max: number) =>
  z.number({ message: `${label} must be a number.` }).positive(`${label} must be above zero.`).max(max, `${label} must be at most ${max}.`);

const assayFields = z.object({
  teamId: idSchema,
  name: text(120, 'Name'),
  substrate: text(200, 'Substrate'),
  substrateMm: positive('Substrate concentration', 10_000),
  kmMm: positive('KM', 10_000).nullable().default(null),
  substrateRegime: z.enum(substrateRegimes).default('unknown'),
  readMode: z.enum(readModes, { message: 'Read mode is end-point or kinetic.' }),
  detection: z.enum(detections, { message: 'Detection is absorbance or fluorescence.' }),
  wavelengthNm: z.int('Wavelength must be a whole number of nm.').min(200, 'Wavelength must be 200–1000 nm.').max(1000, 'Wavelength must be 200–1000 nm.'),
  emissionNm: z.int().min(200).max(1000).nullable().default(null),
  quantitation: z.enum(quantitations),
  extinctionCoefficient: positive('Extinction coefficient', 1_000_000).nullable().default(null),
  extinctionUnit: z.enum(extinctionUnits).default('M-1cm-1'),
  pathLengthCm: positive('Path length', 10).nullable().default(null),
  wellVolumeUl: positive('Well volume', 5000),
  temperatureC: z.number({ message: 'Temperature must be a number.' }).min(0, 'Temperature must be 0–100 °C.').max(100, 'Temperature must be 0–100 °C.'),
  stopSolution: optionalText(300, 'Stop solution'),
  /** pKa of a product chromophore whose absorbance depends on pH (e.g. 4-nitrophenol). */
  chromophorePka: z.number().min(0).max(14).nullable().default(null),
  notes: optionalText(4000, 'Notes'),
});

type AssayFields = z.infer<typeof assayFields>;

/** What a whole assay must satisfy, as field → message (empty when fine). */
export function assayProblems(a: Partial<AssayFields>): Record<string, string> {
  const problems: Record<string, string> = {};
  if (a.quantitation === 'extinction' && a.extinctionCoefficient == null) {
    problems.extinctionCoefficient = 'Give the extinction coefficient, or choose a standard curve.';
  }
  if (a.detection === 'fluorescence' && a.quantitation === 'extinction') {
    problems.quantitation = 'Fluorescence needs a standard curve; extinction coefficients apply to absorbance.';
  }
  return problems;
}

function checkAssay(a: Partial<AssayFields>, ctx: z.RefinementCtx) {
  for (const [field, message] of Object.entries(assayProblems(a))) ctx.addIssue({ code: 'custom', path: [field], message });
}

export const assayCreateSchema = assayFields.superRefine(checkAssay);
/** Partial: the server checks the assay as a whole (stored values plus the change) with assayProblems. */
export const assayUpdateSchema = assayFields.omit({ teamId: true }).partial();

export type AssayCreateInput = z.input<typeof assayCreateSchema>;

/**
 * What the assay's design implies for a pH series, said in words (shown on the assay page).
 * A chromophore that ionises near the series makes continuous reads depend on pH.
 */
export function assayCautions(a: Pick<AssayFields, 'readMode' | 'chromophorePka' | 'stopSolution' | 'substrateRegime'>): string[] {
  const notes: string[] = [];
  if (a.chromophorePka != null) {
    if (a.readMode === 'kinetic') {
      notes.push(
        `The product's absorbance depends on pH (chromophore pKa ${a.chromophorePka}): continuous reads need a standard curve at every pH point, or a correction by the ionised fraction.`,
      );
    } else if (!a.stopSolution) {
      notes.push(
        `The product's absorbance depends on pH (chromophore pKa ${a.chromophorePka}): stop the reaction with strong base so one standard serves all pH points, or use per-pH standards.`,
      );
    }
  }
  if (a.substrateRegime === 'unknown') {
    notes.push('Substrate relative to KM is unknown: the profile mixes kcat and kcat/KM effects unless [S] ≫ KM or [S] ≪ KM at every pH.');
  }
  return notes;
}
