// The shape of a buffer system, as a zod schema: the server validates lab-added buffers with it,
// and the unit tests validate the shipped library with it. Units: pKa at 25 °C and I = 0; ΔH in
// kJ/mol; ΔCp in J K⁻¹ mol⁻¹; dpKa/dT in K⁻¹; formula weights in g/mol; density in g/mL.
import { z } from 'zod';

const kebabId = z
  .string()
  .min(1)
  .max(60)
  .regex(/^[a-z0-9]+(-[a-z0-9]+)*$/, 'use lower-case words joined by hyphens, e.g. "sodium-phosphate"');
const text = z.string().min(1).max(400);

export const titrantSchema = z.enum(['NaOH', 'KOH', 'HCl']);
export const saltSchema = z.enum(['NaCl', 'KCl']);

export const royEquationSchema = z
  .object({
    A: z.number().finite(),
    B: z.number().finite(),
    C: z.number().finite(),
    validFromC: z.number().min(0).max(100),
    validToC: z.number().min(0).max(100),
    source: text,
  })
  .refine((r) => r.validFromC < r.validToC, 'validFromC must be below validToC');

export const publishedPointSchema = z.object({
  celsius: z.number().min(0).max(100),
  pKa: z.number().min(0).max(14),
  uncertainty: z.number().positive().max(1).nullable().default(null),
  source: text,
});

export const ionizationSchema = z.object({
  label: z.string().min(1).max(40),
  /** Thermodynamic pKa at 25 °C and I = 0. */
  pKa25: z.number().min(0).max(14),
  /** Charge of the acid (protonated) form of this step. */
  zAcid: z.int().min(-4).max(3),
  dH: z.number().min(-100).max(150).nullable().default(null),
  dCp: z.number().min(-1000).max(1000).nullable().default(null),
  dpKadT: z.number().min(-0.1).max(0.1).nullable().default(null),
  temperatureModel: z.enum(['goldberg', 'roy', 'slope']).default('goldberg'),
  roy: royEquationSchema.nullable().default(null),
  publishedPoints: z.array(publishedPointSchema).default([]),
  /** [low, high] pH; pKa ± 1 by common practice. */
  usefulRange: z.tuple([z.number().min(-1).max(15), z.number().min(-1).max(15)]),
  sources: z.object({
    /** The source cell of SCIENCE.md §2.5 (or the lab's reference), verbatim. */
    row: text,
    pKa25: text,
    dH: text.nullable().default(null),
    dCp: text.nullable().default(null),
    dpKadT: text.nullable().default(null),
    usefulRange: text.default('pKa ± 1 (common practice, no source)'),
  }),
  /** Default pair for a recipe by mixing: [acid form id, base form id]. */
  mixFormIds: z.tuple([kebabId, kebabId]).nullable().default(null),
  /** Default titration: start form and strong titrant. */
  titration: z.object({ startFormId: kebabId, titrant: titrantSchema }).nullable().default(null),
  note: z.string().max(1000).nullable().default(null),
});

export const counterIonsSchema = z.object({
  Na: z.number().min(0).max(4).default(0),
  K: z.number().min(0).max(4).default(0),
  Cl: z.number().min(0).max(4).default(0),
});

export const formSchema = z.object({
  id: kebabId,
  name: z.string().min(1).max(120),
  /** Molecular formula, hydrate water after "·"; the formula weight is computed from it. */
  formula: z.string().min(1).max(80),
  formulaWeight: z.number().positive().max(5000),
  /** Buffer molecules per formula unit (4 for borax, Na2B4O7·10H2O). */
  unitsPerFormula: z.number().positive().max(8).default(1),
  /** Strong counter-ions per formula unit; they fix the form's place in the charge balance. */
  counterIons: counterIonsSchema.default({ Na: 0, K: 0, Cl: 0 }),
  state: z.enum(['solid', 'liquid']).default('solid'),
  /** g/mL, for liquids measured by volume. */
  density: z.number().positive().max(3).nullable().default(null),
  note: z.string().max(1000).nullable().default(null),
});

export const bufferSystemSchema = z
  .object({
    id: kebabId,
    name: z.string().min(1).max(120),
    aliases: z.array(z.string().min(1).max(60)).default([]),
    ionizations: z.array(ionizationSchema).min(1).max(3),
    forms: z.array(formSchema).min(1).max(20),
    /** Offered by the series designer unless the user asks for it by name. */
    designerDefault: z.boolean().default(true),
    cautions: z.array(z.string().max(400)).default([]),
    notes: z.array(z.string().max(1000)).default([]),
  })
  .superRefine((system, ctx) => checkConsistency(system, ctx));

type SystemOutput = z.output<typeof bufferSystemSchema>;

function checkConsistency(s: Omit<SystemOutput, never>, ctx: z.RefinementCtx): void {
  const issue = (message: string, path: (string | number)[]) =>
    ctx.addIssue({ code: 'custom', message, path });
  const ions = s.ionizations;
  ions.forEach((ion, i) => {
    if (i > 0 && ion.pKa25 <= ions[i - 1].pKa25)
      issue('pKa values must rise from one step to the next', ['ionizations', i, 'pKa25']);
    if (ion.zAcid !== ions[0].zAcid - i)
      issue('each step must lower the charge by one', ['ionizations', i, 'zAcid']);
    if (ion.usefulRange[0] >= ion.usefulRange[1])
      issue('useful range must run low to high', ['ionizations', i, 'usefulRange']);
    if (ion.temperatureModel === 'roy' && !ion.roy)
      issue('temperatureModel "roy" needs a Roy equation', ['ionizations', i, 'roy']);
    if (ion.temperatureModel === 'goldberg' && ion.dH === null && ion.dpKadT === null)
      issue('give ΔH or dpKa/dT', ['ionizations', i, 'dH']);
  });
  const ids = new Set<string>();
  const zTop = ions[0].zAcid;
  const zBottom = zTop - ions.length;
  s.forms.forEach((form, f) => {
    if (ids.has(form.id)) issue(`duplicate form id "${form.id}"`, ['forms', f, 'id']);
    ids.add(form.id);
    const q = -(form.counterIons.Na + form.counterIons.K - form.counterIons.Cl) / form.unitsPerFormula;
    // One proton beyond the modelled top is allowed: a strong first step that is not modelled.
    if (q < zBottom - 1e-9 || q > zTop + 1 + 1e-9)
      issue('counter-ions do not match any protonation state of this buffer', ['forms', f, 'counterIons']);
    if (form.state === 'liquid' && form.density === null)
      issue('a liquid form needs its density', ['forms', f, 'density']);
  });
  ions.forEach((ion, i) => {
    for (const id of [...(ion.mixFormIds ?? []), ...(ion.titration ? [ion.titration.startFormId] : [])]) {
      if (!ids.has(id)) issue(`unknown form id "${id}"`, ['ionizations', i]);
    }
  });
}

export type BufferSystem = z.output<typeof bufferSystemSchema>;
export type BufferSystemInput = z.input<typeof bufferSystemSchema>;
export type Ionization = BufferSystem['ionizations'][number];
export type BufferForm = BufferSystem['forms'][number];
export type Titrant = z.output<typeof titrantSchema>;
export type Salt = z.output<typeof saltSchema>;
