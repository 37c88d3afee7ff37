// What the scientist chose on the import screen, turned into the selection the server imports:
// each chosen block as its own read, and grids marked "part of a time course" combined into one
// kinetic read with times start, start + interval, … (in block order).
import type { ImportSelection } from '@shared/schemas/plates';
import type { BlockPreview } from '@shared/schemas/plates-types';

export type BlockChoice = { include: boolean; asSeries: boolean; label: string; wavelength: string };
export type SeriesChoice = {
  start: string;
  interval: string;
  unit: 's' | 'min';
  label: string;
  wavelength: string;
};

export const initialChoice = (b: BlockPreview): BlockChoice => ({
  include: b.formatMatchesPlate,
  asSeries: false,
  label: b.label,
  wavelength: b.wavelengthNm == null ? '' : String(b.wavelengthNm),
});

export const initialSeries: SeriesChoice = {
  start: '0',
  interval: '60',
  unit: 's',
  label: '',
  wavelength: '',
};

type Built = { ok: true; selection: ImportSelection; reads: number } | { ok: false; message: string };

function wavelength(
  text: string,
  what: string,
): { ok: true; value: number | null } | { ok: false; message: string } {
  if (text.trim() === '') return { ok: true, value: null };
  const n = Number(text);
  return Number.isInteger(n) && n >= 200 && n <= 1000
    ? { ok: true, value: n }
    : { ok: false, message: `${what}: the wavelength is a whole number of nm from 200 to 1000.` };
}

/** Times of the combined grids in seconds: start + k × interval. */
export function seriesTimes(series: SeriesChoice, count: number): number[] | null {
  const factor = series.unit === 'min' ? 60 : 1;
  const start = Number(series.start.replace(',', '.'));
  const step = Number(series.interval.replace(',', '.'));
  if (!Number.isFinite(start) || start < 0 || !Number.isFinite(step) || step <= 0) return null;
  return Array.from({ length: count }, (_, k) => Math.round((start + k * step) * factor * 1000) / 1000);
}

export function buildSelection(blocks: BlockPreview[], choices: BlockChoice[], series: SeriesChoice): Built {
  const selection: ImportSelection = [];
  const grids: number[] = [];
  for (const b of blocks) {
    const c = choices[b.index];
    if (!c?.include) continue;
    const what = `Block ${b.index + 1} (${b.label})`;
    if (!b.formatMatchesPlate)
      return { ok: false, message: `${what} is a ${b.plateFormat}-well plate; it does not fit this plate.` };
    if (c.asSeries && b.kind === 'endpoint') {
      grids.push(b.index);
      continue;
    }
    const w = wavelength(c.wavelength, what);
    if (!w.ok) return w;
    const label = c.label.trim().slice(0, 200);
    selection.push({ type: b.kind, blockIndex: b.index, wavelengthNm: w.value, ...(label ? { label } : {}) });
  }
  if (grids.length === 1)
    return {
      ok: false,
      message: 'A time course needs at least two grids: mark another, or import the grid as a single read.',
    };
  if (grids.length >= 2) {
    const timesS = seriesTimes(series, grids.length);
    if (!timesS)
      return { ok: false, message: 'Give the time course a start of 0 or more and an interval above 0.' };
    const w = wavelength(series.wavelength, 'The time course');
    if (!w.ok) return w;
    const label = series.label.trim().slice(0, 200);
    selection.push({
      type: 'grids-as-kinetic',
      blockIndices: grids,
      timesS,
      wavelengthNm: w.value,
      ...(label ? { label } : {}),
    });
  }
  if (selection.length === 0) return { ok: false, message: 'Pick at least one block to import.' };
  return { ok: true, selection, reads: selection.length };
}
