// The asymptotes of the log plot (SCIENCE.md §1.5): log10 v is made of straight stretches whose
// slopes are whole numbers, one per proton gained or lost, and neighbouring stretches meet at the
// pKa values. From a fit's parameters (v in activity units):
//   acid  (§1.1):  log V + (pH − pKa) [+1],  log V [0]
//   base  (§1.1):  log V [0],  log V − (pH − pKa) [−1]
//   bell  (§1.2):  log V + (pH − pKa1) [+1],  log V [0],  log V − (pH − pKa2) [−1]
//   bell-plateau (§1.3): log V_lo [0], then the bell's three lines on V_mid, then log V_hi [0]
//     (the plateaus only where they are above zero)
//   three (§1.4):  log V + 2pH − pKa − pKb [+2],  log V + pH − pKb [+1],  log V [0],  log V − pH + pKc [−1]
// A pKa that is not determined (null) drops its stretch.
import type { ModelId } from '@shared/fitting';

export type Line = { slope: number; intercept: number };
export type Meeting = { pH: number; log: number; name: string };

type Values = Record<string, number | null | undefined>;

const ok = (v: number | null | undefined): v is number => typeof v === 'number' && Number.isFinite(v);
const lg = (v: number | null | undefined) => (ok(v) && v > 0 ? Math.log10(v) : null);

export function logAsymptotes(model: ModelId, p: Values): { lines: Line[]; meetings: Meeting[] } {
  const lines: Line[] = [];
  const meetings: Meeting[] = [];
  const meet = (name: string, pH: number | null | undefined, log: number | null) => {
    if (ok(pH) && log !== null) meetings.push({ name, pH, log });
  };
  if (model === 'bell-plateau') {
    const mid = lg(p.V_mid);
    if (mid === null) return { lines, meetings };
    const low = lg(p.V_lo);
    const high = lg(p.V_hi);
    if (low !== null) lines.push({ slope: 0, intercept: low });
    if (ok(p.pKa1)) lines.push({ slope: 1, intercept: mid - p.pKa1 });
    lines.push({ slope: 0, intercept: mid });
    if (ok(p.pKa2)) lines.push({ slope: -1, intercept: mid + p.pKa2 });
    if (high !== null) lines.push({ slope: 0, intercept: high });
    meet('pKa1', p.pKa1, mid);
    meet('pKa2', p.pKa2, mid);
    return { lines, meetings };
  }
  const logV = lg(p.V);
  if (logV === null) return { lines, meetings };
  if (model === 'three') {
    if (ok(p.pKa) && ok(p.pKb)) lines.push({ slope: 2, intercept: logV - p.pKa - p.pKb });
    if (ok(p.pKb)) lines.push({ slope: 1, intercept: logV - p.pKb });
    lines.push({ slope: 0, intercept: logV });
    if (ok(p.pKc)) lines.push({ slope: -1, intercept: logV + p.pKc });
    // +2 meets +1 at pH = pKa, at height log V + pKa − pKb.
    if (ok(p.pKa) && ok(p.pKb)) meet('pKa', p.pKa, logV + p.pKa - p.pKb);
    meet('pKb', p.pKb, logV);
    meet('pKc', p.pKc, logV);
    return { lines, meetings };
  }
  const acidPka = model === 'acid' ? p.pKa : model === 'bell' ? p.pKa1 : null;
  const basePka = model === 'base' ? p.pKa : model === 'bell' ? p.pKa2 : null;
  if (ok(acidPka)) lines.push({ slope: 1, intercept: logV - acidPka });
  lines.push({ slope: 0, intercept: logV });
  if (ok(basePka)) lines.push({ slope: -1, intercept: logV + basePka });
  meet(model === 'bell' ? 'pKa1' : 'pKa', acidPka, logV);
  meet(model === 'bell' ? 'pKa2' : 'pKa', basePka, logV);
  return { lines, meetings };
}
