import { z } from 'zod';
import { plateFormatSchema, plateMapSchema } from '../plate-map/schema';
import { idSchema, text } from './common';

export const plateCreateSchema = z.object({
  name: text(80, 'Plate name'),
  format: plateFormatSchema,
  /** Start from a saved template or from another plate's map (same format). */
  templateId: idSchema.nullable().default(null),
  copyFromPlateId: idSchema.nullable().default(null),
});

export const plateRenameSchema = z.object({ name: text(80, 'Plate name') });

export const plateMapSaveSchema = z.object({
  /** The version the editor started from; an older one gets 409. */
  version: z.int().min(1),
  map: plateMapSchema,
});

export const plateCopySchema = z.object({
  name: text(80, 'Plate name'),
  /** Copy into another study of the same team (defaults to the same study). */
  studyId: idSchema.nullable().default(null),
});

export const templateCreateSchema = z.object({
  teamId: idSchema,
  name: text(80, 'Template name'),
  format: plateFormatSchema,
  map: plateMapSchema,
});

export const templateListQuery = z.object({ teamId: idSchema.optional(), format: z.coerce.number().optional() });

const wavelength = z.int().min(200).max(1000).nullable().default(null);

/** What the scientist confirmed on the import screen: which blocks become which reads. */
export const importSelectionSchema = z
  .array(
    z.discriminatedUnion('type', [
      z.object({ type: z.literal('endpoint'), blockIndex: z.int().min(0), label: z.string().max(200).optional(), wavelengthNm: wavelength }),
      z.object({ type: z.literal('kinetic'), blockIndex: z.int().min(0), label: z.string().max(200).optional(), wavelengthNm: wavelength }),
      z.object({
        /** Several end-point grids that are successive reads of one time course. */
        type: z.literal('grids-as-kinetic'),
        blockIndices: z.array(z.int().min(0)).min(2, 'Pick at least two grids for a time course.'),
        timesS: z.array(z.number().min(0)),
        label: z.string().max(200).optional(),
        wavelengthNm: wavelength,
      }),
    ]),
  )
  .min(1, 'Pick at least one block to import.')
  .max(50);

export type ImportSelection = z.output<typeof importSelectionSchema>;
