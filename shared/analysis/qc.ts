/**
 * Step 6: plate QC (SCIENCE.md §3.3) — Z′ and robust Z′ (z-prime.ts), replicate CVs, outliers, blank
 * drift across pH, row/column/edge trends, overlap points, and the plate-map checks of shared/plate-map.
 */
import { blankDrift, centreByGroup, parseWell, plateTrends, replicateStats } from '../plate';
import { checkPlateMap } from '../plate-map';
import type { AnalysisInput, OverlapTest, PlateInput, PlateQc, ReplicateCv, WellRow } from './types';
import { groupBy, pointKey, zPrimeQc } from './z-prime';

/** Replicate CV limit, %: a common acceptance limit for plate assays (common practice, no source). */
export const CV_LIMIT_PERCENT = 20;

export function replicateCvs(rows: readonly WellRow[]): ReplicateCv[] {
  const samples = rows.filter(
    (r) => r.role === 'sample' && !r.excluded && r.activity !== null && r.pH !== null && r.variantId,
  );
  const out: ReplicateCv[] = [];
  for (const members of groupBy(samples, pointKey).values()) {
    const s = replicateStats(members.map((r) => r.activity));
    if (!s.ok) continue;
    const cv = s.value.cvPercent;
    out.push({
      variantId: members[0].variantId!,
      pH: members[0].pH!,
      buffer: members[0].buffer,
      n: s.value.n,
      mean: s.value.mean,
      sd: s.value.sd,
      cvPercent: cv,
      overLimit: cv !== null && cv > CV_LIMIT_PERCENT,
    });
  }
  return out.sort((a, b) => a.variantId.localeCompare(b.variantId) || a.pH - b.pH);
}

/**
 * Trends on sample activities centred on their variant × pH point mean (shared/plate centreByGroup, then
 * plateTrends), so that the plate's design does not read as an artefact. Only position effects inside
 * replicate groups remain: a gradient along the direction in which the groups are laid out cannot be
 * told from the design, and with replicates side by side the test keeps only part of its power
 * (the spread of the column index between groups dilutes the slope).
 */
function trendsOf(rows: readonly WellRow[], plate: PlateInput): PlateQc['trends'] {
  const samples = rows.filter(
    (r) =>
      r.role === 'sample' &&
      !r.excluded &&
      r.activity !== null &&
      r.pH !== null &&
      parseWell(r.well, plate.format).ok,
  );
  if (samples.length === 0) return null;
  const values = Object.fromEntries(samples.map((r) => [r.well, r.activity]));
  const groups = Object.fromEntries(samples.map((r) => [r.well, pointKey(r)]));
  const t = plateTrends(centreByGroup(values, groups), plate.format);
  return t.ok ? t.value : null;
}

export function plateQc(
  plate: PlateInput,
  rows: readonly WellRow[],
  input: AnalysisInput,
  overlaps: readonly OverlapTest[],
): PlateQc {
  const zPrime = zPrimeQc(rows, input.referenceVariantId);
  const cvs = replicateCvs(rows);
  const blanks = rows.filter((r) => r.role === 'blank' && !r.excluded && r.pH !== null);
  const drift = blanks.length ? blankDrift(blanks.map((r) => ({ pH: r.pH!, value: r.signal }))) : null;
  const trends = trendsOf(rows, plate);
  const mine = overlaps.filter((o) => o.plateIds.includes(plate.id));
  const variantNames = Object.fromEntries(input.variants.map((v) => [v.id, v.name]));
  const map = {
    ...plate.map,
    replicatesRequired: input.settings.replicatesRequired ?? plate.map.replicatesRequired ?? 3,
  };
  const mapChecks = checkPlateMap(map, {
    format: plate.format,
    variantNames,
    needsStandardCurve: input.assay.quantitation === 'standard-curve',
  });
  const flags = new Set<string>(plate.read ? [] : ['no_read']);
  for (const f of zPrime.flags) flags.add(f);
  if (drift?.ok) for (const f of drift.value.flags) if (f === 'blank_drift') flags.add(f);
  for (const f of trends?.flags ?? []) if (f !== 'too_few_wells') flags.add(f);
  if (cvs.some((c) => c.overLimit)) flags.add('cv_over_limit');
  if (rows.some((r) => r.outlier)) flags.add('outlier');
  if (mine.some((o) => o.flagged)) flags.add('buffer_effect');
  return {
    plateId: plate.id,
    name: plate.name,
    format: plate.format,
    hasRead: plate.read !== null,
    zPrime,
    replicateCvs: cvs,
    outliers: rows
      .filter((r) => r.outlier)
      .map((r) => ({ plateId: r.plateId, well: r.well, score: r.outlierScore })),
    blankDrift: drift?.ok ? drift.value : null,
    trends,
    overlaps: mine,
    mapChecks,
    flags: [...flags],
  };
}
