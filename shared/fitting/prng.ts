// mulberry32: a small, fast 32-bit seeded generator (Tommy Ettinger, public domain [memory]).
// Good enough for resampling; not for cryptography. Same seed, same sequence, on every platform.

export type Random = () => number;

/** Uniform numbers in [0, 1) from a 32-bit seed. */
export function mulberry32(seed: number): Random {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** A uniform integer in 0 … n−1. */
export function randomIndex(random: Random, n: number): number {
  return Math.min(n - 1, Math.floor(random() * n));
}
