import { z } from 'zod';
import type { ComparisonResult } from '../comparison/compare';
import type { CurveBand, GlobalFit } from '../fitting';
import { idSchema, optionalText, text } from './common';

export const comparisonEntrySchema = z.object({ studyId: idSchema, variantId: idSchema });

const sharedParameters = ['pKa1', 'pKa2', 'pKa'] as const;

export const comparisonInputSchema = z
  .object({
    teamId: idSchema,
    entries: z.array(comparisonEntrySchema).min(1, 'Pick at least one profile.').max(40, 'At most 40 profiles.'),
    referenceKey: z.string().regex(/^[0-9a-f-]{36}:[0-9a-f-]{36}$/, 'Pick the reference profile.'),
    includeUnapproved: z.boolean().default(false),
    globalFit: z
      .object({ model: z.enum(['bell', 'acid', 'base']).default('bell'), shared: z.array(z.enum(sharedParameters)).min(1, 'Share at least one parameter.') })
      .nullable()
      .default(null),
  })
  .refine((c) => c.entries.some((e) => `${e.studyId}:${e.variantId}` === c.referenceKey), {
    message: 'The reference must be one of the chosen profiles.',
    path: ['referenceKey'],
  });

export const comparisonSaveSchema = comparisonInputSchema.and(z.object({ name: text(120, 'Name'), notes: optionalText(4000, 'Notes') }));
export const comparisonUpdateSchema = comparisonSaveSchema.and(z.object({ version: z.int().min(1) }));

export const availableProfilesQuery = z.object({
  teamId: idSchema.optional(),
  includeUnapproved: z.enum(['true', 'false']).optional().transform((v) => v === 'true'),
});

export type ComparisonInput = z.output<typeof comparisonInputSchema>;

export type AvailableProfile = {
  studyId: string;
  studyName: string;
  studyStatus: string;
  approved: boolean;
  teamId: string;
  variantId: string;
  variantName: string;
  isParent: boolean;
  model: string | null;
  pHopt: number | null;
  assayName: string;
  temperatureC: number;
  computedAt: string;
};

export type ComparisonCurve = {
  key: string;
  label: string;
  approved: boolean;
  points: { pH: number; mean: number | null; sd: number | null }[];
  curve: CurveBand | null;
};

export type ComparisonView = {
  result: ComparisonResult;
  curves: ComparisonCurve[];
  units: Record<string, string>;
  globalFit: (GlobalFit & { labels: Record<string, string> }) | { error: string } | null;
  /** The profiles' provenance: engine version and input hash of each stored fit. */
  provenance: {
    key: string;
    engineVersion: string;
    inputHash: string;
    computedAt: string;
    approvedAt: string | null;
    approvedBy: string | null;
    /** The study's raw reader files (name and SHA-256). */
    rawFiles: { fileName: string; sha256: string }[];
  }[];
};

export type SavedComparison = {
  id: string;
  teamId: string;
  name: string;
  notes: string;
  entries: { studyId: string; variantId: string }[];
  referenceKey: string;
  includeUnapproved: boolean;
  globalFit: ComparisonInput['globalFit'];
  version: number;
  createdBy: string;
  createdByName?: string;
  createdAt: string;
  updatedAt: string;
  /** In lists: each entry's "variant — study" label (null when that profile no longer exists). */
  labels?: Record<string, string | null>;
};
