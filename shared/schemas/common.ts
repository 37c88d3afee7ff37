import { z } from 'zod';

export const idSchema = z.uuid({ message: 'Not a valid identifier.' });
export const idParams = z.object({ id: idSchema });

/** Trimmed, non-empty text with a length cap (over-long strings are refused, not cut). */
export const text = (max: number, label = 'This field') =>
  z
    .string({ message: `${label} must be text.` })
    .trim()
    .min(1, `${label} is required.`)
    .max(max, `${label} must be at most ${max} characters.`);

export const optionalText = (max: number, label = 'This field') =>
  z
    .string({ message: `${label} must be text.` })
    .trim()
    .max(max, `${label} must be at most ${max} characters.`)
    .default('');

export const emailSchema = z
  .string({ message: 'E-mail must be text.' })
  .trim()
  .toLowerCase()
  .max(254, 'E-mail must be at most 254 characters.')
  .pipe(z.email({ message: 'Enter a valid e-mail address.' }));

export const paginationQuery = z.object({
  limit: z.coerce.number().int().min(1).max(500).default(100),
  offset: z.coerce.number().int().min(0).default(0),
});

/** The one error shape every API failure uses. */
export type ApiErrorBody = { error: { code: string; message: string; fields?: Record<string, string> } };
