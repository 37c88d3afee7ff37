// The buffer series designer's request: what the scientist asks for. The server designs the
// series from it (shared/chemistry designSeries) and stores both.
import { z } from 'zod';
import type { Series } from '../chemistry';
import { idSchema, text } from './common';

const pH = z.number({ message: 'pH must be a number.' }).min(0, 'pH must be between 0 and 14.').max(14, 'pH must be between 0 and 14.');

/** pH points from start to stop (inclusive) in steps, rounded to 0.01. */
export function expandPHRange(start: number, stop: number, step: number): number[] {
  if (!(step > 0) || stop < start) return [];
  const count = Math.floor((stop - start) / step + 1e-9) + 1;
  return Array.from({ length: Math.min(count, 200) }, (_, i) => Math.round((start + i * step) * 100) / 100);
}

export const additionSchema = z.object({
  label: text(80, 'Label'),
  volumeUl: z.number({ message: 'Volume must be a number.' }).positive('Volume must be above zero.').max(10_000),
  /** The solution's own buffer (e.g. the enzyme's storage buffer); null for water. */
  buffer: z
    .object({ systemId: z.string().min(1).max(60), concMm: z.number().positive().max(2000), pH })
    .nullable()
    .default(null),
});

export const seriesInputSchema = z.object({
  pHPoints: z.array(pH).min(1, 'Give at least one pH point.').max(96, 'At most 96 pH points.'),
  assayTemperatureC: z.number({ message: 'Temperature must be a number.' }).min(0, 'Temperature must be 0–100 °C.').max(100, 'Temperature must be 0–100 °C.'),
  makeTemperatureC: z.number().min(0, 'Temperature must be 0–100 °C.').max(100, 'Temperature must be 0–100 °C.').default(25),
  bufferConcMm: z.number({ message: 'Concentration must be a number.' }).positive('Concentration must be above zero.').max(2000, 'At most 2000 mM.'),
  volumeMl: z.number({ message: 'Volume must be a number.' }).positive('Volume must be above zero.').max(100_000),
  targetIonicStrengthM: z.number().min(0, 'Ionic strength cannot be negative.').max(3, 'At most 3 M.').nullable().default(null),
  salt: z.enum(['NaCl', 'KCl']).default('NaCl'),
  method: z.enum(['mix', 'titrate']).default('titrate'),
  /** Allowed systems (ids); null = every system the designer offers by default. */
  systems: z.array(z.string().min(1).max(60)).max(80).nullable().default(null),
  overlap: z.boolean().default(true),
  /** The scientist's choice of system at a pH point, keyed by the pH written with two decimals. */
  overrides: z.record(z.string().regex(/^\d{1,2}\.\d{2}$/), z.string().min(1).max(60)).default({}),
  well: z
    .object({
      bufferVolumeUl: z.number().positive('Buffer volume must be above zero.').max(10_000),
      additions: z.array(additionSchema).max(6),
    })
    .nullable()
    .default(null),
});

export type SeriesInputRequest = z.input<typeof seriesInputSchema>;
export type SeriesRequest = z.output<typeof seriesInputSchema>;

export const seriesSaveSchema = z.object({
  teamId: idSchema,
  name: text(120, 'Name'),
  input: seriesInputSchema,
  /** Attach the saved series to this study (it must be editable). */
  studyId: idSchema.nullable().default(null),
});

export const seriesUpdateSchema = z.object({
  name: text(120, 'Name').optional(),
  input: seriesInputSchema.optional(),
  version: z.int().min(1),
});

export const phKey = (value: number) => value.toFixed(2);

export type DesignedSeries = Series & { overridden: string[] };

export type SeriesSummary = { id: string; teamId: string; teamName: string; name: string; input: SeriesRequest; updatedAt: string; createdBy: string };

export type SeriesDetail = {
  id: string;
  teamId: string;
  name: string;
  input: SeriesRequest;
  design: DesignedSeries;
  version: number;
  createdBy: string;
  createdAt: string;
  updatedAt: string;
  usedBy: { id: string; name: string; status: string }[];
};
