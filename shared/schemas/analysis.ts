// Requests of the analysis screens: settings (rate windows, models, which read and preparation),
// exclusions with their reasons, and the background bootstrap.
import { z } from 'zod';
import type { AnalysisResult, AnalysisSettings } from '../analysis';
import { MODEL_IDS } from '../fitting';
import { idSchema, text } from './common';

const windowSchema = z
  .object({ startS: z.number().min(0), endS: z.number().min(0) })
  .refine((w) => w.endS > w.startS, { message: 'The window must end after it starts.' });

const wellName = z.string().regex(/^[A-P](?:[1-9]|1\d|2[0-4])$/, 'Not a well name (A1 … P24).');

export const analysisSettingsSchema = z.object({
  rateWindows: z
    .object({
      plate: z.record(idSchema, windowSchema).optional(),
      variant: z.record(idSchema, windowSchema).optional(),
      well: z.record(z.string().regex(/^[0-9a-f-]{36}:[A-P]\d{1,2}$/, 'Key wells as plateId:A1.'), windowSchema).optional(),
    })
    .optional(),
  lagS: z.number().min(0).max(36_000).optional(),
  enzymeVolumeUl: z.number().positive().max(10_000).nullable().optional(),
  reactionTimeMin: z.number().positive().max(10_000).nullable().optional(),
  models: z.record(idSchema, z.enum([...MODEL_IDS, 'auto'])).optional(),
  replicatesRequired: z.int().min(1).max(24).optional(),
  /** Which read of each plate the analysis uses (default: the newest read of the assay's read mode). */
  plateReads: z.record(idSchema, idSchema).optional(),
  /** Which preparation of each variant gives the protein concentration (default: the newest). */
  preparations: z.record(idSchema, idSchema).optional(),
});
export type StudyAnalysisSettings = z.infer<typeof analysisSettingsSchema>;

export const settingsSaveSchema = z.object({ version: z.int().min(1), settings: analysisSettingsSchema });

/** One plate's wells, `{ plateId, wells: ['A1', …] }`, is taken as the list form below. */
function onePlateToList(raw: unknown): unknown {
  if (raw === null || typeof raw !== 'object') return raw;
  const { plateId, wells, ...rest } = raw as Record<string, unknown>;
  if (typeof plateId !== 'string' || !Array.isArray(wells) || !wells.every((w) => typeof w === 'string')) return raw;
  return { ...rest, wells: wells.map((well) => ({ plateId, well })) };
}

/** Wells to exclude, from one or several plates of the study, with one reason: kept all or none. */
export const exclusionCreateSchema = z.preprocess(
  onePlateToList,
  z.object({
    wells: z
      .array(z.object({ plateId: idSchema, well: wellName }))
      .min(1, 'Pick at least one well.')
      .max(4 * 384, 'At most 1,536 wells at once.'),
    reason: text(1000, 'Reason'),
  }),
);
export type ExclusionCreate = z.infer<typeof exclusionCreateSchema>;

export const exclusionLiftSchema = z.object({ reason: text(1000, 'Reason') });

export const bootstrapStartSchema = z.object({ resamples: z.int().min(100).max(10_000).default(1000) });

export type ExclusionView = {
  id: string;
  plateId: string;
  plateName: string;
  well: string;
  reason: string;
  createdBy: string;
  createdAt: string;
  liftedAt: string | null;
  liftedBy: string | null;
  liftReason: string | null;
};

export type AnalysisJob = {
  id: string;
  kind: string;
  state: 'queued' | 'running' | 'done' | 'failed';
  done: number;
  total: number;
  error: string | null;
  createdAt: string;
  finishedAt: string | null;
  current: boolean;
};

export type StudyAnalysis = {
  studyId: string;
  inputHash: string;
  computedAt: string;
  /** Approved studies show the stored result even when the engine has changed since. */
  frozen: boolean;
  settings: StudyAnalysisSettings;
  settingsVersion: number;
  exclusions: ExclusionView[];
  result: AnalysisResult;
  /** Bootstrap intervals are in `result` when their input hash matches this analysis. */
  bootstrap: { current: boolean; at: string | null; resamples: number | null };
  job: AnalysisJob | null;
  /** Predicted well pH (buffer + enzyme + substrate, from the study's buffer series) against the nominal pH. */
  wellPh: { pH: number; buffer: string | null; predicted: number | null; drift: number | null; overLimit: boolean }[];
  /** The read each plate's analysis used (null: the plate has none). */
  plateReads: Record<string, string | null>;
  assay: { readMode: 'endpoint' | 'kinetic'; quantitation: 'extinction' | 'standard-curve' };
};

/** POST /api/studies/:id/analysis/recompute: a fresh computation beside the stored one (nothing stored). */
export type RecomputeComparison = {
  stored: { inputHash: string; engineVersion: string; analysisVersion: string; computedAt: string } | null;
  recomputed: { inputHash: string; engineVersion: string; analysisVersion: string };
  sameInputs: boolean;
  differences: {
    variantId: string;
    name: string;
    model: { stored: string | null; recomputed: string | null };
    parameters: Record<string, { stored: number | null; recomputed: number | null; relativeDifference: number | null }>;
  }[];
};

export type EngineSettings = AnalysisSettings;
