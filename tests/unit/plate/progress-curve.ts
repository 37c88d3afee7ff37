/**
 * Generated progress curves for the kinetic tests (invented data, said so in every test that uses it).
 *
 * Michaelis–Menten with no product inhibition, integrated (Schnell & Mendoza 1997, J Theor Biol
 * 187:207 [memory] give the Lambert W form):
 *   S(t) = Km·W((S0/Km)·exp((S0 − Vmax·t)/Km)),   P(t) = S0 − S(t),   v0 = Vmax·S0/(Km + S0)
 * W is evaluated in log form: W(e^x) is the w > 0 with w + ln w = x (Newton). The tests check it
 * against a numerical integration of dS/dt = −Vmax·S/(Km + S).
 */

/** W(e^x): the solution w > 0 of w + ln w = x. */
export function lambertWOfExp(x: number): number {
  let w = x < 1 ? Math.exp(x) : x - Math.log(x);
  for (let i = 0; i < 100; i++) {
    const f = w + Math.log(w) - x;
    const step = f / (1 + 1 / w);
    let next = w - step;
    if (next <= 0) next = w / 2;
    if (Math.abs(next - w) <= 1e-15 * Math.max(1, w)) return next;
    w = next;
  }
  return w;
}

export interface MichaelisMenten {
  s0: number;
  km: number;
  vmax: number;
}

/** Product concentration at time t (same units as s0; t in the unit of vmax). */
export function productAt(t: number, mm: MichaelisMenten): number {
  if (t <= 0) return 0;
  const x = Math.log(mm.s0 / mm.km) + (mm.s0 - mm.vmax * t) / mm.km;
  return mm.s0 - mm.km * lambertWOfExp(x);
}

export function initialVelocity(mm: MichaelisMenten): number {
  return (mm.vmax * mm.s0) / (mm.km + mm.s0);
}

/** dS/dt = −Vmax·S/(Km + S) by classical Runge–Kutta, for checking productAt. */
export function productByIntegration(t: number, mm: MichaelisMenten, steps = 20000): number {
  const h = t / steps;
  const f = (s: number) => (-mm.vmax * s) / (mm.km + s);
  let s = mm.s0;
  for (let i = 0; i < steps; i++) {
    const k1 = f(s);
    const k2 = f(s + (h / 2) * k1);
    const k3 = f(s + (h / 2) * k2);
    const k4 = f(s + h * k3);
    s += (h / 6) * (k1 + 2 * k2 + 2 * k3 + k4);
  }
  return mm.s0 - s;
}

/** Seeded uniform generator (mulberry32), so generated noise is the same on every run. */
export function seededUniform(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Seeded standard normal deviates (Box–Muller). */
export function seededNormal(seed: number): () => number {
  const u = seededUniform(seed);
  return () => {
    const u1 = Math.max(u(), 1e-300);
    return Math.sqrt(-2 * Math.log(u1)) * Math.cos(2 * Math.PI * u());
  };
}

export interface GeneratedTrace {
  times: number[];
  values: number[];
  /** True initial slope of the signal, per second. */
  trueSlope: number;
  /** Fraction of substrate converted at each read. */
  conversion: number[];
}

/**
 * Absorbance trace (generated): A(t) = a0 + εl·P(t − lag) + noise, reads every `step` seconds.
 * With lag > 0 nothing happens before `lag` (mixing / temperature), then the reaction runs.
 */
export function generatedTrace(opts: {
  mm: MichaelisMenten;
  /** absorbance per unit of product concentration (ε·l) */
  epsL: number;
  a0: number;
  step: number;
  reads: number;
  noiseSd?: number;
  seed?: number;
  lag?: number;
}): GeneratedTrace {
  const noise = seededNormal(opts.seed ?? 1);
  const lag = opts.lag ?? 0;
  const times: number[] = [];
  const values: number[] = [];
  const conversion: number[] = [];
  for (let i = 0; i < opts.reads; i++) {
    const t = i * opts.step;
    const p = productAt(t - lag, opts.mm);
    times.push(t);
    conversion.push(p / opts.mm.s0);
    values.push(opts.a0 + opts.epsL * p + (opts.noiseSd ?? 0) * noise());
  }
  return { times, values, trueSlope: opts.epsL * initialVelocity(opts.mm), conversion };
}
