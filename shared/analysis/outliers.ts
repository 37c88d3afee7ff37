/**
 * Step 4: robust outlier flags within replicate groups (shared/plate flagOutliers: modified z-score
 * Mᵢ = 0.6745·(xᵢ − x̃)/MAD, flagged when |Mᵢ| > 3.5; Iglewicz & Hoaglin 1993 [memory]).
 * Samples are grouped by variant, pH point and buffer across the study, on their activity; blanks by
 * plate, pH point and buffer, on their signal. Excluded wells stay in their group — the flag describes
 * the data, and excluding a flagged well must not move the flags of the others. Flags only.
 */
import { flagOutliers } from '../plate';
import { phKey } from './blanks';
import type { WellRow } from './types';

function groupKey(r: WellRow): string | null {
  if (r.pH === null) return null;
  if (r.role === 'sample' && r.variantId) return `s|${r.variantId}|${phKey(r.pH)}|${r.buffer ?? ''}`;
  if (r.role === 'blank') return `b|${r.plateId}|${phKey(r.pH)}|${r.buffer ?? ''}`;
  return null;
}

export function markOutliers(rows: readonly WellRow[]): void {
  const groups = new Map<string, WellRow[]>();
  for (const r of rows) {
    const key = groupKey(r);
    if (key) groups.set(key, [...(groups.get(key) ?? []), r]);
  }
  for (const members of groups.values()) {
    const values = members.map((r) => (r.role === 'sample' ? r.activity : r.signal));
    if (values.filter((v) => v !== null).length < 3) continue;
    const result = flagOutliers(values);
    if (!result.ok) continue;
    members.forEach((r, i) => {
      r.outlierScore = result.value.scores[i];
      if (result.value.outliers[i]) {
        r.outlier = true;
        r.flags.push('outlier');
      }
    });
  }
}
