import { z } from 'zod';
import { idSchema, optionalText, text } from './common';

export const studyStatuses = ['draft', 'in_review', 'approved', 'returned'] as const;
export type StudyStatus = (typeof studyStatuses)[number];

export const studyStatusLabels: Record<StudyStatus, string> = {
  draft: 'Draft',
  in_review: 'In review',
  approved: 'Approved',
  returned: 'Returned',
};

const studyFields = z.object({
  teamId: idSchema,
  name: text(160, 'Name'),
  enzymeId: idSchema,
  variantIds: z.array(idSchema).min(1, 'Include at least one variant.').max(200),
  referenceVariantId: idSchema,
  assayId: idSchema,
  bufferSeriesId: idSchema.nullable().default(null),
  notes: optionalText(8000, 'Notes'),
});

function referenceIncluded(s: { variantIds?: string[]; referenceVariantId?: string }, ctx: z.RefinementCtx) {
  if (s.variantIds && s.referenceVariantId && !s.variantIds.includes(s.referenceVariantId)) {
    ctx.addIssue({ code: 'custom', path: ['referenceVariantId'], message: 'The reference variant must be one of the variants included.' });
  }
}

export const studyCreateSchema = studyFields.superRefine(referenceIncluded);
export const studyUpdateSchema = studyFields.omit({ teamId: true, enzymeId: true }).partial().superRefine(referenceIncluded);

export type StudyCreateInput = z.input<typeof studyCreateSchema>;

export const studyListQuery = z.object({
  teamId: idSchema.optional(),
  status: z.enum(studyStatuses).optional(),
  mine: z
    .enum(['true', 'false'])
    .optional()
    .transform((v) => v === 'true'),
});
