/**
 * Step 5: one profile per variant — its points (replicate mean, SD, n, CV per pH point and buffer,
 * the wells behind each, the excluded wells with their reasons listed apart) and its fit
 * (fit-variant.ts: all non-excluded replicate wells are fitted, not the means).
 */
import { replicateStats } from '../plate';
import { phKey } from './blanks';
import { fitVariant, relativeActivity } from './fit-variant';
import type { AnalysisInput, ProfilePoint, VariantInput, VariantProfile, WellRow } from './types';

function point(members: WellRow[]): ProfilePoint {
  const used = members.filter((r) => !r.excluded && r.activity !== null);
  const stats = used.length ? replicateStats(used.map((r) => r.activity)) : null;
  const s = stats?.ok ? stats.value : null;
  return {
    pH: members[0].pH!,
    buffer: members[0].buffer,
    n: used.length,
    mean: s?.mean ?? null,
    sd: s?.sd ?? null,
    cvPercent: s?.cvPercent ?? null,
    wells: used.map((r) => ({ plateId: r.plateId, well: r.well })),
    excluded: members
      .filter((r) => r.excluded)
      .map((r) => ({
        plateId: r.plateId,
        well: r.well,
        exclusionId: r.exclusion!.id,
        reason: r.exclusion!.reason,
      })),
    missing: members
      .filter((r) => !r.excluded && r.activity === null)
      .map((r) => ({ plateId: r.plateId, well: r.well })),
    flags: s ? s.flags.filter((f) => f !== 'missing_values') : [],
  };
}

export function profilePoints(rows: readonly WellRow[]): ProfilePoint[] {
  const groups = new Map<string, WellRow[]>();
  for (const r of rows) {
    const key = `${phKey(r.pH!)}|${r.buffer ?? ''}`;
    groups.set(key, [...(groups.get(key) ?? []), r]);
  }
  return [...groups.values()]
    .map(point)
    .sort((a, b) => a.pH - b.pH || (a.buffer ?? '').localeCompare(b.buffer ?? ''));
}

export function buildProfile(
  variant: VariantInput,
  rows: readonly WellRow[],
  input: AnalysisInput,
): VariantProfile {
  const mine = rows.filter((r) => r.role === 'sample' && r.variantId === variant.id && r.pH !== null);
  const points = profilePoints(mine);
  const byWell = new Map(mine.map((r) => [`${r.plateId}:${r.well}`, r]));
  const fitRows = points.flatMap((p) => p.wells).map((ref) => byWell.get(`${ref.plateId}:${ref.well}`)!);
  const fitData = {
    wells: fitRows.map((r) => ({ plateId: r.plateId, well: r.well })),
    pH: fitRows.map((r) => r.pH!),
    v: fitRows.map((r) => r.activity!),
  };
  const requested = input.settings.models?.[variant.id] ?? 'auto';
  const result = fitVariant(variant.name, fitData, requested, input.settings.profileIntervals ?? true);
  const profile: VariantProfile = {
    variantId: variant.id,
    name: variant.name,
    isParent: variant.isParent,
    isReference: variant.id === input.referenceVariantId,
    points,
    fitData,
    ...result,
    relative: null,
    bootstrap: null,
  };
  profile.relative = relativeActivity(profile);
  return profile;
}
