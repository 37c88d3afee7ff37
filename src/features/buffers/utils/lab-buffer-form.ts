// The admin's "Add a lab buffer" form: its values (text where people type lists, numbers as typed),
// how they become the JSON the API expects (a whole buffer system), and a resolver that validates
// that JSON with the SAME shared schema the server uses, putting each message on its field.
import { toNestErrors } from '@hookform/resolvers';
import type { FieldError, FieldValues, Resolver } from 'react-hook-form';
import { z } from 'zod';
import { bufferSystemSchema, type BufferSystem, type BufferSystemInput } from '@shared/chemistry';

export type TemperatureModelChoice = 'goldberg' | 'slope' | 'roy';

export type LabIonizationValues = {
  label: string;
  pKa25: number;
  zAcid: number;
  dH: number | null;
  dCp: number | null;
  dpKadT: number | null;
  temperatureModel: TemperatureModelChoice;
  roy: { A: number; B: number; C: number; validFromC: number; validToC: number; source: string };
  usefulLow: number | null;
  usefulHigh: number | null;
  sources: { row: string; pKa25: string; dH: string; dCp: string; dpKadT: string };
  mixAcid: string;
  mixBase: string;
  titrationStart: string;
  titrant: 'NaOH' | 'KOH' | 'HCl';
  note: string;
};

export type LabFormValues = {
  id: string;
  name: string;
  formula: string;
  formulaWeight: number;
  unitsPerFormula: number;
  counterIons: { Na: number; K: number; Cl: number };
  state: 'solid' | 'liquid';
  density: number | null;
  note: string;
};

export type LabBufferValues = {
  id: string;
  name: string;
  aliasesText: string;
  designerDefault: boolean;
  cautionsText: string;
  notesText: string;
  ionizations: LabIonizationValues[];
  forms: LabFormValues[];
};

const USEFUL_RANGE_SOURCE = 'pKa ± 1 (common practice, no source)';
const lines = (text: string) =>
  text
    .split('\n')
    .map((s) => s.trim())
    .filter(Boolean);
const orNull = (text: string) => (text.trim() === '' ? null : text.trim());
const round4 = (x: number) => Math.round(x * 10000) / 10000;

export const emptyIonization = (): LabIonizationValues => ({
  label: 'pKa',
  pKa25: Number.NaN,
  zAcid: 0,
  dH: null,
  dCp: null,
  dpKadT: null,
  temperatureModel: 'goldberg',
  roy: { A: Number.NaN, B: Number.NaN, C: Number.NaN, validFromC: 5, validToC: 55, source: '' },
  usefulLow: null,
  usefulHigh: null,
  sources: { row: '', pKa25: '', dH: '', dCp: '', dpKadT: '' },
  mixAcid: '',
  mixBase: '',
  titrationStart: '',
  titrant: 'NaOH',
  note: '',
});

export const emptyForm = (): LabFormValues => ({
  id: '',
  name: '',
  formula: '',
  formulaWeight: Number.NaN,
  unitsPerFormula: 1,
  counterIons: { Na: 0, K: 0, Cl: 0 },
  state: 'solid',
  density: null,
  note: '',
});

export const emptyLabBuffer = (): LabBufferValues => ({
  id: '',
  name: '',
  aliasesText: '',
  designerDefault: true,
  cautionsText: '',
  notesText: '',
  ionizations: [emptyIonization()],
  forms: [emptyForm()],
});

/** A lower-case id from a name: "Sodium glycinate" → "sodium-glycinate". */
export function slugOf(name: string): string {
  // NFKD splits "é" into "e" and a combining accent; the accent goes, not the letter after it.
  return name
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 60);
}

function toIonization(v: LabIonizationValues): BufferSystemInput['ionizations'][number] {
  const useful: [number, number] = [v.usefulLow ?? round4(v.pKa25 - 1), v.usefulHigh ?? round4(v.pKa25 + 1)];
  const givenRange = v.usefulLow !== null || v.usefulHigh !== null;
  return {
    label: v.label.trim(),
    pKa25: v.pKa25,
    zAcid: v.zAcid,
    dH: v.dH,
    dCp: v.dCp,
    dpKadT: v.dpKadT,
    temperatureModel: v.temperatureModel,
    roy: v.temperatureModel === 'roy' ? { ...v.roy, source: v.roy.source.trim() } : null,
    publishedPoints: [],
    usefulRange: useful,
    sources: {
      row: v.sources.row.trim() || v.sources.pKa25.trim(),
      pKa25: v.sources.pKa25.trim(),
      dH: v.dH === null ? null : orNull(v.sources.dH),
      dCp: v.dCp === null ? null : orNull(v.sources.dCp),
      dpKadT: v.dpKadT === null ? null : orNull(v.sources.dpKadT),
      usefulRange: givenRange ? v.sources.pKa25.trim() || 'lab' : USEFUL_RANGE_SOURCE,
    },
    mixFormIds: v.mixAcid && v.mixBase ? [v.mixAcid, v.mixBase] : null,
    titration: v.titrationStart ? { startFormId: v.titrationStart, titrant: v.titrant } : null,
    note: orNull(v.note),
  };
}

/** The JSON body of POST/PUT /api/buffers. */
export function toSystem(v: LabBufferValues): BufferSystemInput {
  return {
    id: v.id.trim(),
    name: v.name.trim(),
    aliases: v.aliasesText
      .split(',')
      .map((s) => s.trim())
      .filter(Boolean),
    ionizations: v.ionizations.map(toIonization),
    forms: v.forms.map((f) => ({
      ...f,
      id: f.id.trim(),
      name: f.name.trim(),
      formula: f.formula.trim(),
      note: orNull(f.note),
    })),
    designerDefault: v.designerDefault,
    cautions: lines(v.cautionsText),
    notes: lines(v.notesText),
  };
}

/**
 * The default useful range (pKa ± 1, credited to common practice) opens as "not given", so that
 * saving unchanged keeps its source instead of crediting it to the pKa's source.
 */
const isDefaultRange = (ion: BufferSystem['ionizations'][number]) =>
  ion.sources.usefulRange === USEFUL_RANGE_SOURCE &&
  ion.usefulRange[0] === round4(ion.pKa25 - 1) &&
  ion.usefulRange[1] === round4(ion.pKa25 + 1);

/** Form values from a saved lab system (for editing). */
export function fromSystem(s: BufferSystem): LabBufferValues {
  return {
    id: s.id,
    name: s.name,
    aliasesText: s.aliases.join(', '),
    designerDefault: s.designerDefault,
    cautionsText: s.cautions.join('\n'),
    notesText: s.notes.join('\n'),
    ionizations: s.ionizations.map((ion) => ({
      label: ion.label,
      pKa25: ion.pKa25,
      zAcid: ion.zAcid,
      dH: ion.dH,
      dCp: ion.dCp,
      dpKadT: ion.dpKadT,
      temperatureModel: ion.temperatureModel,
      roy: ion.roy ?? emptyIonization().roy,
      usefulLow: isDefaultRange(ion) ? null : ion.usefulRange[0],
      usefulHigh: isDefaultRange(ion) ? null : ion.usefulRange[1],
      sources: {
        row: ion.sources.row,
        pKa25: ion.sources.pKa25,
        dH: ion.sources.dH ?? '',
        dCp: ion.sources.dCp ?? '',
        dpKadT: ion.sources.dpKadT ?? '',
      },
      mixAcid: ion.mixFormIds?.[0] ?? '',
      mixBase: ion.mixFormIds?.[1] ?? '',
      titrationStart: ion.titration?.startFormId ?? '',
      titrant: ion.titration?.titrant ?? 'NaOH',
      note: ion.note ?? '',
    })),
    forms: s.forms.map((f) => ({ ...f, note: f.note ?? '' })),
  };
}

/** Where the shared schema's message for a path belongs in this form. */
function fieldOf(path: PropertyKey[]): string {
  const key = path.map(String).join('.');
  if (key.startsWith('aliases')) return 'aliasesText';
  if (key.startsWith('cautions')) return 'cautionsText';
  if (key.startsWith('notes')) return 'notesText';
  let m = /^ionizations\.(\d+)\.usefulRange/.exec(key);
  if (m) return `ionizations.${m[1]}.usefulLow`;
  m = /^ionizations\.(\d+)\.sources\.(\w+)$/.exec(key);
  if (m) return m[2] === 'usefulRange' ? `ionizations.${m[1]}.usefulLow` : key;
  m = /^ionizations\.(\d+)\.roy$/.exec(key);
  if (m) return `ionizations.${m[1]}.temperatureModel`;
  m = /^ionizations\.(\d+)\.(mixFormIds|titration)/.exec(key);
  if (m) return `ionizations.${m[1]}.${m[2] === 'mixFormIds' ? 'mixAcid' : 'titrationStart'}`;
  // "unknown form id" is reported on the ionization itself: it names a recipe form.
  m = /^ionizations\.(\d+)$/.exec(key);
  if (m) return `ionizations.${m[1]}.mixAcid`;
  if (key === 'ionizations' || key === 'forms') return `${key}.root`;
  return key || 'root';
}

export const labBufferSchema = z.custom<LabBufferValues>().transform(toSystem).pipe(bufferSystemSchema);

/** react-hook-form resolver: the shared bufferSystemSchema decides; messages land on their fields. */
export const labBufferResolver: Resolver<LabBufferValues, unknown, BufferSystemInput> = async (
  values,
  _context,
  options,
) => {
  const result = labBufferSchema.safeParse(values);
  if (result.success) return { values: toSystem(values), errors: {} };
  const flat: Record<string, FieldError> = {};
  for (const issue of result.error.issues) {
    const name = fieldOf(issue.path);
    flat[name] ??= { type: issue.code, message: issue.message };
  }
  return { values: {}, errors: toNestErrors(flat as never, options as never) as FieldValues };
};
