// Generated (invented) pH profiles for tests: model values plus seeded Gaussian noise.
import { evaluateModel, mulberry32, type ModelId } from '@shared/fitting';

export function gaussian(seed: number): () => number {
  const random = mulberry32(seed);
  // Box–Muller transform
  return () => Math.sqrt(-2 * Math.log(1 - random())) * Math.cos(2 * Math.PI * random());
}

export const grid = (lo: number, hi: number, n: number): number[] =>
  Array.from({ length: n }, (_, i) => lo + ((hi - lo) * i) / (n - 1));

export function simulate(model: ModelId, theta: number[], pH: number[], sd: number, seed: number) {
  const r = evaluateModel(model, theta, pH);
  if (!r.ok) throw new Error(r.error.message);
  const noise = gaussian(seed);
  return { pH, v: (r.value as number[]).map((x) => x + sd * noise()) };
}
