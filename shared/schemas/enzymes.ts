// Enzymes, variants and preparations: the request schemas the server validates with and the
// client's forms use.
import { z } from 'zod';
import { idSchema, optionalText, text } from './common';

const aminoAcids = 'ACDEFGHIKLMNPQRSTVWY';
const substitution = new RegExp(`^([${aminoAcids}])([1-9][0-9]{0,4})([${aminoAcids}*])$`);

/**
 * Parses a mutation list in the usual one-letter notation, e.g. "D92N/S110A" (wild-type residue,
 * position, new residue; '*' for a stop). Returns the normalised list or a message saying what is
 * wrong. The empty string is the parent (no mutations).
 */
export function parseMutations(input: string): { ok: true; value: string[] } | { ok: false; message: string } {
  const trimmed = input.trim();
  if (trimmed === '') return { ok: true, value: [] };
  const parts = trimmed.split(/\s*[/,+;]\s*|\s+/).filter(Boolean);
  const seen = new Map<number, string>();
  for (const part of parts) {
    const m = substitution.exec(part.toUpperCase());
    if (!m) return { ok: false, message: `"${part}" is not a substitution like D92N (residue, position, new residue).` };
    const [, from, position, to] = m;
    if (from === to) return { ok: false, message: `"${part}" changes nothing (${from} to ${to}).` };
    const pos = Number(position);
    if (seen.has(pos)) return { ok: false, message: `Position ${pos} appears twice (${seen.get(pos)} and ${part}).` };
    seen.set(pos, part.toUpperCase());
  }
  return { ok: true, value: [...seen.entries()].sort((a, b) => a[0] - b[0]).map(([, s]) => s) };
}

export const mutationsSchema = z
  .string({ message: 'Mutations must be text.' })
  .max(2000, 'The mutation list is too long.')
  .default('')
  .transform((value, ctx) => {
    const parsed = parseMutations(value);
    if (!parsed.ok) {
      ctx.addIssue({ code: 'custom', message: parsed.message });
      return z.NEVER;
    }
    return parsed.value.join('/');
  });

export const enzymeCreateSchema = z.object({
  teamId: idSchema,
  name: text(120, 'Name'),
  organism: optionalText(200, 'Source organism'),
  notes: optionalText(4000, 'Notes'),
});
export const enzymeUpdateSchema = enzymeCreateSchema.omit({ teamId: true }).partial();

export const variantCreateSchema = z.object({
  name: text(120, 'Name'),
  mutations: mutationsSchema,
  isParent: z.boolean().default(false),
  notes: optionalText(4000, 'Notes'),
});
export const variantUpdateSchema = variantCreateSchema.partial();

const isoDate = z.iso.date({ message: 'Use a date like 2026-03-14.' });

export const preparationCreateSchema = z.object({
  lot: text(80, 'Lot'),
  proteinMgPerMl: z
    .number({ message: 'Protein concentration must be a number.' })
    .positive('Protein concentration must be above zero.')
    .max(1000, 'Protein concentration above 1000 mg/mL is not plausible.'),
  preparedOn: isoDate,
  storageBuffer: optionalText(300, 'Storage buffer'),
  notes: optionalText(4000, 'Notes'),
});
export const preparationUpdateSchema = preparationCreateSchema.partial();

export const teamFilterQuery = z.object({ teamId: idSchema.optional() });

export type EnzymeCreateInput = z.input<typeof enzymeCreateSchema>;
export type VariantCreateInput = z.input<typeof variantCreateSchema>;
export type PreparationCreateInput = z.input<typeof preparationCreateSchema>;
