// Wald–Wolfowitz runs test on the signs of the residuals taken in order of pH
// (Wald & Wolfowitz 1940, Ann Math Stat 11:147). Too few runs means the residuals come in
// blocks: the model misses a systematic feature of the data. The p-value is exact, from the
// distribution of the number of runs R given n₁ positive and n₂ negative signs:
//   P(R = 2k)     = 2·C(n₁−1, k−1)·C(n₂−1, k−1) / C(n₁+n₂, n₁)
//   P(R = 2k + 1) = [C(n₁−1, k−1)·C(n₂−1, k) + C(n₁−1, k)·C(n₂−1, k−1)] / C(n₁+n₂, n₁)

import { gammaln } from 'simple-statistics';

export interface RunsTest {
  runs: number;
  positive: number;
  negative: number;
  expected: number;
  /** P(R ≤ observed): small when there are too few runs */
  pValue: number;
}

// log k! for k = 0, 1, …, grown on demand (runs tests are run on every fit)
const logFactorials: number[] = [0];

function logFactorial(k: number): number {
  while (logFactorials.length <= k) logFactorials.push(gammaln(logFactorials.length + 1));
  return logFactorials[k];
}

function logChoose(n: number, k: number): number {
  if (k < 0 || k > n) return -Infinity;
  return logFactorial(n) - logFactorial(k) - logFactorial(n - k);
}

function probRuns(r: number, n1: number, n2: number): number {
  const total = logChoose(n1 + n2, n1);
  if (r % 2 === 0) {
    const k = r / 2;
    return 2 * Math.exp(logChoose(n1 - 1, k - 1) + logChoose(n2 - 1, k - 1) - total);
  }
  const k = (r - 1) / 2;
  return (
    Math.exp(logChoose(n1 - 1, k - 1) + logChoose(n2 - 1, k) - total) +
    Math.exp(logChoose(n1 - 1, k) + logChoose(n2 - 1, k - 1) - total)
  );
}

/**
 * Runs test on residuals ordered by x (ties keep their input order; zero residuals, and points
 * whose weight is 0 when weights are given, are left out). Returns null when there are fewer
 * than two signs of either kind.
 */
export function runsTest(
  x: ArrayLike<number>,
  residuals: ArrayLike<number | null>,
  weights?: ArrayLike<number>,
): RunsTest | null {
  const order: number[] = [];
  let sorted = true;
  for (let i = 0; i < residuals.length; i++) {
    const r = residuals[i];
    if (r === null || r === 0 || !Number.isFinite(r) || (weights && !(weights[i] > 0))) continue;
    if (order.length > 0 && x[i] < x[order[order.length - 1]]) sorted = false;
    order.push(i);
  }
  if (!sorted) order.sort((a, b) => x[a] - x[b] || a - b);
  let positive = 0;
  let negative = 0;
  let runs = 0;
  let last = 0;
  for (const i of order) {
    const s = (residuals[i] as number) > 0 ? 1 : -1;
    if (s > 0) positive++;
    else negative++;
    if (s !== last) runs++;
    last = s;
  }
  if (positive < 2 || negative < 2) return null;
  let pValue = 0;
  for (let r = 2; r <= runs; r++) pValue += probRuns(r, positive, negative);
  const expected = (2 * positive * negative) / (positive + negative) + 1;
  return { runs, positive, negative, expected, pValue: Math.min(1, pValue) };
}
