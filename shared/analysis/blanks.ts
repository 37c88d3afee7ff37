/**
 * Step 2: blank correction (SCIENCE.md §3.1): from each sample subtract the mean of the blank wells
 * (no enzyme) of the same pH point, on the same plate and in the same buffer:
 *   corrected = x − b̄,   u(corrected) = √(u(x)² + s_b²/n_b)
 * (shared/plate blank.ts: one mean is subtracted, so its standard error counts, not the wells' SD);
 * u(x) is a kinetic rate's slope SE. End points have no u(x) and get no SE (see below).
 * When that group is empty the nearest stand-in is used and flagged: the same pH on the same plate in
 * any buffer, then the same pH (and buffer) on other plates. No blank at the pH at all: null, flagged.
 * Excluded blanks and blanks without a signal are left out. pH points match to 0.01 (as the map checks).
 */
import { blankStats } from '../plate';
import { num } from './result';
import type { BlankGroup, BlankUsed, WellRow } from './types';

export const phKey = (pH: number): string => pH.toFixed(2);

export class BlankBook {
  private readonly members = new Map<string, WellRow[]>();
  private readonly stats = new Map<string, BlankGroup | null>();

  constructor(rows: readonly WellRow[]) {
    for (const r of rows) {
      if (r.role !== 'blank' || r.excluded || r.signal === null || r.pH === null) continue;
      const ph = phKey(r.pH);
      const buffer = r.buffer ?? '';
      for (const key of [
        `${r.plateId}|${ph}|${buffer}`,
        `${r.plateId}|${ph}|*`,
        `*|${ph}|${buffer}`,
        `*|${ph}|*`,
      ]) {
        const list = this.members.get(key) ?? [];
        list.push(r);
        this.members.set(key, list);
      }
    }
  }

  private group(key: string): BlankGroup | null {
    if (this.stats.has(key)) return this.stats.get(key)!;
    const rows = this.members.get(key) ?? [];
    const s = rows.length ? blankStats(rows.map((r) => r.signal)) : null;
    const [, ph, buffer] = key.split('|');
    const group: BlankGroup | null = s?.ok
      ? {
          key,
          plateIds: [...new Set(rows.map((r) => r.plateId))],
          pH: Number(ph),
          buffer: buffer === '*' ? null : buffer || null,
          n: s.value.n,
          mean: s.value.mean,
          sd: s.value.sd,
          se: s.value.se,
          wells: rows.map((r) => ({ plateId: r.plateId, well: r.well })),
          flags: s.value.flags,
        }
      : null;
    this.stats.set(key, group);
    return group;
  }

  /** The blank for a sample, and the flag saying it is a stand-in (if it is). */
  match(row: WellRow): { blank: BlankUsed; flags: string[] } | null {
    if (row.pH === null) return null;
    const ph = phKey(row.pH);
    const buffer = row.buffer ?? '';
    const tries: [string, BlankUsed['match'], string | null][] = [
      [`${row.plateId}|${ph}|${buffer}`, 'same-buffer', null],
      [`${row.plateId}|${ph}|*`, 'same-pH', row.buffer ? 'blank_other_buffer' : null],
      [`*|${ph}|${buffer}`, 'other-plate', 'blank_other_plate'],
      [`*|${ph}|*`, 'other-plate', 'blank_other_plate'],
    ];
    for (const [key, match, flag] of tries) {
      const g = this.group(key);
      if (g)
        return {
          blank: { key, mean: g.mean, se: g.se, n: g.n, match },
          flags: flag ? [flag, ...g.flags] : g.flags,
        };
    }
    return null;
  }

  /** Every group that was used, for result.blanks. */
  used(): BlankGroup[] {
    return [...this.stats.values()].filter((g): g is BlankGroup => g !== null);
  }
}

/** Fills blank, corrected and correctedSe of the sample rows. */
export function correctBlanks(rows: WellRow[]): BlankGroup[] {
  const book = new BlankBook(rows);
  for (const row of rows) {
    if (row.role !== 'sample' || row.signal === null) continue;
    const m = book.match(row);
    if (!m) {
      row.flags.push('no_blank');
      continue;
    }
    row.blank = m.blank;
    for (const f of m.flags) if (f !== 'missing_values') row.flags.push(f);
    row.corrected = num(row.signal - m.blank.mean);
    // A single end-point read has no error of its own: a partial error (the blank's alone) would look
    // precise, so none is given, and the spread of the replicates tells how well the point is known.
    row.correctedSe = row.signalSe === null ? null : num(Math.hypot(row.signalSe, m.blank.se ?? 0));
  }
  return book.used();
}
