// Speciation of an acid with up to three (or more) dissociation steps, from cumulative constants.
// With species H_nA (index 0) … A (index n) and β_j = Ka1·…·Kaj:
//   α_j = (β_j / h^j) / Σ_k (β_k / h^k)
// computed in log10 space (log(β_j/h^j) = Σ_{i≤j} (pH − pKa_i)) so extreme pH never overflows.

/** Fractions of each protonation state, most protonated first; they sum to 1. */
export function speciesFractions(pKas: readonly number[], pH: number): number[] {
  const logs = [0];
  for (const pKa of pKas) logs.push(logs[logs.length - 1] + (pH - pKa));
  const top = Math.max(...logs);
  const weights = logs.map((l) => 10 ** (l - top));
  const total = weights.reduce((a, b) => a + b, 0);
  return weights.map((w) => w / total);
}

/** Mean number of protons lost, n̄ = Σ j α_j. */
export function meanProtonsLost(fractions: readonly number[]): number {
  return fractions.reduce((sum, a, j) => sum + j * a, 0);
}

/**
 * Variance of the protons lost, Σ j² α_j − n̄². ln10·C times this is the buffer's own capacity
 * dC_base/dpH; for one step it is α(1 − α) (Van Slyke's C·Ka·h/(Ka + h)²).
 */
export function protonVariance(fractions: readonly number[]): number {
  const mean = meanProtonsLost(fractions);
  const second = fractions.reduce((sum, a, j) => sum + j * j * a, 0);
  return Math.max(0, second - mean * mean);
}
