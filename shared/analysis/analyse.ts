/**
 * analyseStudy: plate reads → per-well rates → blank correction → product and activity → replicate
 * points and fitted pH profiles → plate QC. Pure: no I/O, the same input always gives the same result.
 *
 *   1. signals.ts   rate per well (automatic or set window) or end-point value
 *   2. blanks.ts    minus the blank mean of the same plate, pH point and buffer
 *   3. convert.ts   product by Beer–Lambert or standard curve; per mg when possible (units.ts)
 *   4. outliers.ts  robust flags within replicate groups
 *   5. profiles.ts  points and fits per variant
 *   6. qc.ts        Z′, CVs, blank drift, trends, overlap points, map checks
 * Exclusions (always with a reason) apply before blanks and curves are built: an excluded blank or
 * standard is not used, an excluded sample is not fitted; every excluded well keeps its row and reason.
 */
import { ENGINE_VERSION } from '../fitting';
import { correctBlanks } from './blanks';
import { convertRow } from './convert';
import { flagTextFor } from './flags';
import { markOutliers } from './outliers';
import { overlapTests, OVERLAP_ALPHA } from './overlaps';
import { buildProfile } from './profiles';
import { CV_LIMIT_PERCENT, plateQc } from './qc';
import { guarded, ok, type Result } from './result';
import { plateRows } from './signals';
import { StandardBook } from './standards';
import type { AnalysisInput, AnalysisNote, AnalysisResult, WellRow } from './types';
import { planUnits } from './units';
import { checkInput } from './validate';

/** Version of this pipeline (how wells become profiles); stored beside the fitting engine's version. */
export const ANALYSIS_VERSION = '1.0.0';

function collectFlags(result: Omit<AnalysisResult, 'flagText'>): Set<string> {
  const codes = new Set<string>();
  for (const w of result.wells) for (const f of w.flags) codes.add(f);
  for (const b of result.blanks) for (const f of b.flags) codes.add(f);
  for (const c of result.standardCurves) for (const f of c.flags) codes.add(f);
  for (const p of result.profiles) for (const pt of p.points) for (const f of pt.flags) codes.add(f);
  for (const q of result.qc.plates) {
    for (const f of q.flags) codes.add(f);
    for (const f of q.zPrime.flags) codes.add(f);
    for (const f of q.blankDrift?.flags ?? []) codes.add(f);
    for (const f of q.trends?.flags ?? []) codes.add(f);
  }
  return codes;
}

function studyNotes(rows: readonly WellRow[], input: AnalysisInput): AnalysisNote[] {
  const known = new Set(input.variants.map((v) => v.id));
  const strays = rows.filter((r) => r.role === 'sample' && r.variantId && !known.has(r.variantId));
  const notes: AnalysisNote[] = [];
  if (strays.length) {
    notes.push({
      level: 'warning',
      code: 'unknown_variant',
      message: `${strays.length} sample well(s) name a variant that is not in the study; they are in no profile.`,
    });
  }
  const unread = input.plates.filter((p) => !p.read);
  if (unread.length) {
    notes.push({
      level: 'warning',
      code: 'plate_without_read',
      message: `No read yet for ${unread.map((p) => p.name).join(', ')}: its wells have no values.`,
    });
  }
  return notes;
}

function run(raw: AnalysisInput): Result<AnalysisResult> {
  const checked = checkInput(raw);
  if (!checked.ok) return checked;
  const { input, exclusions, notes } = checked.value;
  const byPlate = new Map(input.plates.map((p) => [p.id, plateRows(p, input)]));
  const rows = [...byPlate.values()].flat();
  for (const row of rows) {
    const e = exclusions.get(`${row.plateId}:${row.well}`);
    if (!e) continue;
    row.excluded = true;
    row.exclusion = { id: e.id, reason: e.reason };
  }
  const blanks = correctBlanks(rows);
  const standards = new StandardBook(rows);
  const plan = planUnits(input, standards.any);
  const variants = new Map(input.variants.map((v) => [v.id, v]));
  for (const row of rows)
    convertRow(row, input, plan, standards, row.variantId ? variants.get(row.variantId) : undefined);
  markOutliers(rows);
  const profiles = input.variants.map((v) => buildProfile(v, rows, input));
  const overlaps = overlapTests(rows);
  const qcPlates = input.plates.map((p) => plateQc(p, byPlate.get(p.id)!, input, overlaps));
  const result: Omit<AnalysisResult, 'flagText'> = {
    engineVersion: ENGINE_VERSION,
    analysisVersion: ANALYSIS_VERSION,
    units: plan.units,
    wells: rows,
    blanks,
    standardCurves: standards.records(),
    profiles,
    qc: { cvLimitPercent: CV_LIMIT_PERCENT, overlapAlpha: OVERLAP_ALPHA, plates: qcPlates, overlaps },
    notes: [...notes, ...studyNotes(rows, input)],
  };
  const codes = collectFlags(result);
  if (overlaps.some((o) => o.flagged)) codes.add('buffer_effect');
  if (overlaps.some((o) => !o.samePlate)) codes.add('different_plates');
  return ok({ ...result, flagText: flagTextFor([...codes].sort()) });
}

/** Analyses a study; bad input gives { ok: false, error } and never throws. */
export function analyseStudy(input: AnalysisInput): Result<AnalysisResult> {
  return guarded(() => run(input));
}
