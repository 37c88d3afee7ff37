// Speed of the study analysis (issue 6 "Speed"): a GENERATED study (tests/fixtures/analysis/make-study.ts,
// invented data) of 4 plates × 384 wells of kinetic reads with 16 variants.
//   npx tsx bench/analysis.ts [--reads 120] [--runs 5] [--resamples 1000]
// Prints, per target, the median wall time and the median CPU time of the process over the runs (the
// CPU figure is what the computation costs; wall time also counts other programs sharing the machine),
// with the split between rates and fits, and the targets: analysis < 2 s, bootstrap < 10 s.
import { analyseStudy, bootstrapProfiles } from '../shared/analysis';
import { plateRows } from '../shared/analysis/signals';
import { makeStudy, manyVariants } from '../tests/fixtures/analysis/make-study';

function arg(name: string, fallback: number): number {
  const i = process.argv.indexOf(`--${name}`);
  return i > 0 ? Number(process.argv[i + 1]) : fallback;
}

const reads = arg('reads', 120);
const runs = arg('runs', 5);
const resamples = arg('resamples', 1000);

function measure<T>(run: () => T): { value: T; wallMs: number; cpuMs: number } {
  const cpu = process.cpuUsage();
  const start = performance.now();
  const value = run();
  const wallMs = performance.now() - start;
  const used = process.cpuUsage(cpu);
  return { value, wallMs, cpuMs: (used.user + used.system) / 1000 };
}

const median = (v: number[]) => [...v].sort((a, b) => a - b)[Math.floor(v.length / 2)];
const fmt = (ms: number) => `${(ms / 1000).toFixed(2)} s`;

const study = makeStudy({
  seed: 2024,
  plates: 4,
  format: 384,
  variants: manyVariants(16),
  replicates: 6,
  blanksPerPoint: 3,
  reads,
  intervalS: Math.max(1, Math.round(600 / reads)),
});
const input = study.input;
const mapped = input.plates.reduce((n, p) => n + Object.keys(p.map.wells).length, 0);
console.log(
  `generated study: ${input.plates.length} plates × ${input.plates[0].format} wells (${mapped} mapped), ${input.variants.length} variants, ${reads} reads per well`,
);

analyseStudy(input); // warm-up (JIT), not counted
const rates: { wallMs: number; cpuMs: number }[] = [];
const whole: { wallMs: number; cpuMs: number }[] = [];
let last = analyseStudy(input);
for (let i = 0; i < runs; i++) {
  rates.push(measure(() => input.plates.map((p) => plateRows(p, input))));
  const m = measure(() => analyseStudy(input));
  whole.push(m);
  last = m.value;
}
if (!last.ok) throw new Error(`analysis failed: ${last.error.message}`);
const result = last.value;
const fitted = result.profiles.filter((p) => p.fit).length;
console.log(
  `analysis (rates, blanks, conversion, ${fitted} fits with model choice and profile intervals, QC), median of ${runs}:`,
);
console.log(
  `  wall ${fmt(median(whole.map((m) => m.wallMs)))}   cpu ${fmt(median(whole.map((m) => m.cpuMs)))}   target < 2 s`,
);
console.log(
  `  of which rates of ${mapped} wells: wall ${fmt(median(rates.map((m) => m.wallMs)))}   cpu ${fmt(median(rates.map((m) => m.cpuMs)))}`,
);

const bootRuns = Math.max(1, Math.min(runs, 3));
const boots: { wallMs: number; cpuMs: number }[] = [];
for (let i = 0; i < bootRuns; i++) {
  const m = measure(() => bootstrapProfiles(result, input, { resamples, seed: 1 }));
  if (!m.value.ok) throw new Error(`bootstrap failed: ${m.value.error.message}`);
  boots.push(m);
}
console.log(`bootstrap, ${resamples} resamples for each of ${fitted} profiles, median of ${bootRuns}:`);
console.log(
  `  wall ${fmt(median(boots.map((m) => m.wallMs)))}   cpu ${fmt(median(boots.map((m) => m.cpuMs)))}   target < 10 s`,
);
