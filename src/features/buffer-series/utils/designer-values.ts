// The designer's form: what the scientist types (pH points as a list or start–stop–step, numbers
// as typed) and how it becomes the request the API validates with the shared seriesInputSchema.
import { z } from 'zod';
import {
  expandPHRange,
  phKey,
  seriesInputSchema,
  type SeriesInputRequest,
  type SeriesRequest,
} from '@shared/schemas/buffer-series';

export type AdditionValues = {
  label: string;
  volumeUl: number;
  inBuffer: boolean;
  systemId: string;
  concMm: number;
  pH: number;
};

export type DesignerValues = {
  pHMode: 'list' | 'range';
  pHList: string;
  pHStart: number;
  pHStop: number;
  pHStep: number;
  assayTemperatureC: number;
  makeTemperatureC: number;
  bufferConcMm: number;
  targetIonicStrengthM: number | null;
  salt: 'NaCl' | 'KCl';
  method: 'titrate' | 'mix';
  volumeMl: number;
  systemsMode: 'default' | 'chosen';
  systems: string[];
  overlap: boolean;
  wellEnabled: boolean;
  bufferVolumeUl: number;
  additions: AdditionValues[];
};

export const newAddition = (label: string): AdditionValues => ({
  label,
  volumeUl: 20,
  inBuffer: false,
  systemId: 'tris',
  concMm: 20,
  pH: 7.5,
});

export const defaultDesignerValues = (): DesignerValues => ({
  pHMode: 'range',
  pHList: '',
  pHStart: 3,
  pHStop: 8,
  pHStep: 0.5,
  assayTemperatureC: 37,
  makeTemperatureC: 25,
  bufferConcMm: 50,
  targetIonicStrengthM: null,
  salt: 'NaCl',
  method: 'titrate',
  volumeMl: 50,
  systemsMode: 'default',
  systems: [],
  overlap: true,
  wellEnabled: true,
  bufferVolumeUl: 160,
  additions: [newAddition('Enzyme solution'), newAddition('Substrate solution')],
});

/** "3, 3.5; 4 4.5" → numbers; the first word that is not a number is reported. */
export function parsePHList(text: string): { ok: true; value: number[] } | { ok: false; message: string } {
  const words = text.split(/[\s,;]+/).filter(Boolean);
  const value: number[] = [];
  for (const w of words) {
    const n = Number(w.replace('−', '-'));
    if (!Number.isFinite(n)) return { ok: false, message: `“${w}” is not a pH value.` };
    value.push(n);
  }
  return { ok: true, value };
}

export function pHPointsOf(v: DesignerValues): number[] {
  if (v.pHMode === 'list') {
    const parsed = parsePHList(v.pHList);
    return parsed.ok ? [...new Set(parsed.value)].sort((a, b) => a - b) : [];
  }
  return expandPHRange(v.pHStart, v.pHStop, v.pHStep);
}

const num = (x: number | null | undefined) => (x === null || x === undefined || Number.isNaN(x) ? null : x);

/** The API request (before the shared schema parses it). Overrides are kept only for points that exist. */
export function toRequest(v: DesignerValues, overrides: Record<string, string> = {}): SeriesInputRequest {
  const pHPoints = pHPointsOf(v);
  const keys = new Set(pHPoints.map(phKey));
  return {
    pHPoints,
    assayTemperatureC: v.assayTemperatureC,
    makeTemperatureC: v.makeTemperatureC,
    bufferConcMm: v.bufferConcMm,
    volumeMl: v.volumeMl,
    targetIonicStrengthM: num(v.targetIonicStrengthM),
    salt: v.salt,
    method: v.method,
    systems: v.systemsMode === 'chosen' ? v.systems : null,
    overlap: v.overlap,
    overrides: Object.fromEntries(Object.entries(overrides).filter(([k]) => keys.has(k))),
    well: v.wellEnabled
      ? {
          bufferVolumeUl: v.bufferVolumeUl,
          additions: v.additions.map((a) => ({
            label: a.label,
            volumeUl: a.volumeUl,
            buffer: a.inBuffer ? { systemId: a.systemId, concMm: a.concMm, pH: a.pH } : null,
          })),
        }
      : null,
  };
}

/** Form values from a saved request (the points come back as a list). */
export function fromRequest(r: SeriesRequest): DesignerValues {
  const base = defaultDesignerValues();
  return {
    ...base,
    pHMode: 'list',
    pHList: r.pHPoints.join(', '),
    assayTemperatureC: r.assayTemperatureC,
    makeTemperatureC: r.makeTemperatureC,
    bufferConcMm: r.bufferConcMm,
    targetIonicStrengthM: r.targetIonicStrengthM,
    salt: r.salt,
    method: r.method,
    volumeMl: r.volumeMl,
    systemsMode: r.systems ? 'chosen' : 'default',
    systems: r.systems ?? [],
    overlap: r.overlap,
    wellEnabled: r.well !== null,
    bufferVolumeUl: r.well?.bufferVolumeUl ?? base.bufferVolumeUl,
    additions:
      r.well?.additions.map((a) => ({
        label: a.label,
        volumeUl: a.volumeUl,
        inBuffer: a.buffer !== null,
        systemId: a.buffer?.systemId ?? 'tris',
        concMm: a.buffer?.concMm ?? 20,
        pH: a.buffer?.pH ?? 7.5,
      })) ?? base.additions,
  };
}

/** The form's own checks (what the shared schema cannot see: the text of the pH list, the range). */
const formChecks = z.custom<DesignerValues>().superRefine((v, ctx) => {
  if (v.pHMode === 'list') {
    const parsed = parsePHList(v.pHList);
    if (!parsed.ok) ctx.addIssue({ code: 'custom', path: ['pHList'], message: parsed.message });
    return;
  }
  for (const key of ['pHStart', 'pHStop', 'pHStep'] as const) {
    if (!Number.isFinite(v[key])) ctx.addIssue({ code: 'custom', path: [key], message: 'Give a number.' });
  }
  if (v.pHStep <= 0)
    ctx.addIssue({ code: 'custom', path: ['pHStep'], message: 'The step must be above zero.' });
  if (v.pHStop < v.pHStart) {
    ctx.addIssue({ code: 'custom', path: ['pHStop'], message: 'Stop must not be below start.' });
  }
});

export const designerSchema = formChecks.transform((v) => toRequest(v)).pipe(seriesInputSchema);

/** Where a message about a request path belongs in the form. */
export function designerFieldOf(path: PropertyKey[], v: DesignerValues): string {
  const [head, ...rest] = path.map(String);
  if (head === 'pHPoints') {
    if (v.pHMode === 'list') return 'pHList';
    return v.pHStart < 0 || v.pHStart > 14 ? 'pHStart' : 'pHStop';
  }
  if (head === 'well') {
    if (rest[0] === 'bufferVolumeUl') return 'bufferVolumeUl';
    if (rest[0] === 'additions' && rest[1] !== undefined) {
      const field = rest[rest.length - 1];
      return `additions.${rest[1]}.${['systemId', 'concMm', 'pH', 'label', 'volumeUl'].includes(field) ? field : 'label'}`;
    }
    return 'bufferVolumeUl';
  }
  if (head === 'systems') return 'systems';
  if (head === 'overrides') return 'root';
  return [head, ...rest].join('.') || 'root';
}

/** Parses the form with the shared schema; on failure, each message goes to the field it is about. */
export function checkDesigner(
  v: DesignerValues,
): { ok: true; request: SeriesRequest } | { ok: false; errors: Record<string, string> } {
  const result = designerSchema.safeParse(v);
  if (result.success) return { ok: true, request: result.data };
  const errors: Record<string, string> = {};
  for (const issue of result.error.issues) errors[designerFieldOf(issue.path, v)] ??= issue.message;
  return { ok: false, errors };
}
