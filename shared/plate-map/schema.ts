// The plate map: what each well holds. Wells not listed have no role and are ignored in analysis.
import { z } from 'zod';
import { isPlateFormat, parseWell, type PlateFormat } from '../plate/geometry';

export const wellRoles = ['sample', 'blank', 'buffer', 'standard', 'unused'] as const;
export type WellRole = (typeof wellRoles)[number];

export const wellRoleLabels: Record<WellRole, string> = {
  sample: 'Sample',
  blank: 'Blank (no enzyme)',
  buffer: 'Buffer only',
  standard: 'Standard',
  unused: 'Unused',
};

export const wellAssignmentSchema = z.object({
  role: z.enum(wellRoles, { message: `Role must be one of: ${wellRoles.join(', ')}.` }),
  variantId: z.uuid().nullable().default(null),
  /** Nominal pH of the well's buffer (a point of the study's buffer series). */
  pH: z.number().min(0, 'pH must be 0–14.').max(14, 'pH must be 0–14.').nullable().default(null),
  /** Buffer system id (e.g. 'mes') when the point has one. */
  buffer: z.string().max(60).nullable().default(null),
  replicate: z.int().min(1).max(99).nullable().default(null),
  /** Standards: product concentration in µM. */
  concentrationUm: z.number().min(0).max(1e7).nullable().default(null),
});
export type WellAssignment = z.output<typeof wellAssignmentSchema>;
export type WellAssignmentInput = z.input<typeof wellAssignmentSchema>;

export const plateMapSchema = z.object({
  wells: z.record(z.string().max(4), wellAssignmentSchema),
  replicatesRequired: z.int().min(1).max(24).default(3),
});
export type PlateMap = z.output<typeof plateMapSchema>;

export const emptyPlateMap = (): PlateMap => ({ wells: {}, replicatesRequired: 3 });

/** A map schema for one format: every key must be a canonical well of that plate. */
export function plateMapSchemaFor(format: PlateFormat) {
  return plateMapSchema.superRefine((map, ctx) => {
    for (const key of Object.keys(map.wells)) {
      const parsed = parseWell(key, format);
      if (!parsed.ok || parsed.value.name !== key) {
        ctx.addIssue({ code: 'custom', path: ['wells', key], message: `"${key}" is not a well of a ${format}-well plate.` });
      }
    }
  });
}

export const plateFormatSchema = z.union([z.literal(96), z.literal(384)], { message: 'Plate format is 96 or 384.' });
export { isPlateFormat };
