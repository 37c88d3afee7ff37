// Maximum of a smooth one-dimensional curve on an interval: a coarse scan, then golden-section
// search around the best scan point (Kiefer 1953). Returns null when the maximum sits at an end
// of the interval (no interior optimum: the curve keeps rising or stays on a plateau).

const GOLD = (Math.sqrt(5) - 1) / 2;

export function numericOptimum(f: (x: number) => number, lo: number, hi: number, scan = 60): number | null {
  if (!(hi > lo)) return null;
  const step = (hi - lo) / scan;
  let best = 0;
  let bestV = -Infinity;
  for (let i = 0; i <= scan; i++) {
    const v = f(lo + i * step);
    if (v > bestV) {
      bestV = v;
      best = i;
    }
  }
  if (!Number.isFinite(bestV) || best === 0 || best === scan) return null;
  let a = lo + (best - 1) * step;
  let b = lo + (best + 1) * step;
  let c = b - GOLD * (b - a);
  let d = a + GOLD * (b - a);
  let fc = f(c);
  let fd = f(d);
  for (let i = 0; i < 200 && b - a > 1e-12 * (1 + Math.abs(a)); i++) {
    if (fc > fd) {
      b = d;
      d = c;
      fd = fc;
      c = b - GOLD * (b - a);
      fc = f(c);
    } else {
      a = c;
      c = d;
      fc = fd;
      d = a + GOLD * (b - a);
      fd = f(d);
    }
  }
  return (a + b) / 2;
}

/** The x where f crosses `level` between a (f ≥ level) and b (f < level), by bisection. */
export function crossing(f: (x: number) => number, a: number, b: number, level: number): number {
  for (let i = 0; i < 200 && Math.abs(b - a) > 1e-13 * (1 + Math.abs(a)); i++) {
    const m = (a + b) / 2;
    if (f(m) >= level) a = m;
    else b = m;
  }
  return (a + b) / 2;
}
