// Which read of a plate the analysis used. The result does not name it, so this follows the
// server's rule (server/services/analysis/input.ts chooseRead): the read chosen in the settings,
// else the newest read of the assay's read mode, else the newest read.
import type { ReadSummary } from '@shared/schemas/plates-types';
import { initialRate } from '@shared/plate';

export function readInUse(
  reads: ReadSummary[],
  chosenId: string | undefined,
  kinetic: boolean,
): ReadSummary | null {
  const newest = [...reads].sort((a, b) => b.uploadedAt.localeCompare(a.uploadedAt));
  return (
    newest.find((r) => r.id === chosenId) ??
    newest.find((r) => r.kind === (kinetic ? 'kinetic' : 'endpoint')) ??
    newest[0] ??
    null
  );
}

/**
 * The straight line fitted over a well's window, for drawing (signal = intercept + slope·t, t in s):
 * the same OLS fit shared/plate's initialRate gives the analysis.
 */
export function windowLine(
  times: number[],
  values: (number | null)[],
  window: { startS: number; endS: number },
) {
  const fit = initialRate(
    { times, values },
    { window: { start: window.startS, end: window.endS }, minPoints: 3 },
  );
  if (!fit.ok || fit.value.slope === null || fit.value.intercept === null) return null;
  return { slope: fit.value.slope, intercept: fit.value.intercept };
}
