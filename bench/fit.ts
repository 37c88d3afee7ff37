// Fitting-engine figures (printed only; nothing is asserted here — the tests check correctness):
//  1. bell fits per second on bell-5000.json through the command line as a whole process, beside
//     the reference figures of shared/reference/README.md, with the agreement to the exact minima
//     (the command line fits the bell through the WebAssembly kernel; the JavaScript engine alone
//     is measured too);
//  2. start-up cost of the command on its own;
//  3. one profile with 1,000 bootstrap resamples;
//  4. ml-levenberg-marquardt on the NIST and reference checks (why Bellwether has its own solver).
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { availableParallelism, loadavg, tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { levenbergMarquardt as mlLevenbergMarquardt } from 'ml-levenberg-marquardt';
import { fitCurve, fitProfile } from '@shared/fitting';
import { lre, NIST_NAMES, readNist } from '../tests/unit/fitting/helpers/nist';

const root = fileURLToPath(new URL('..', import.meta.url));
const fixtures = join(root, 'tests/fixtures/reference');
const REPEATS = 3;
const median = (xs: number[]): number => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
const line = (s: string): void => void process.stdout.write(`${s}\n`);

type Ref = { id: string; V: number; pKa1: number; pKa2: number };
const exact = new Map(
  (JSON.parse(readFileSync(join(fixtures, 'bell-5000.exact.json'), 'utf8')).results as Ref[]).map((r) => [
    r.id,
    r,
  ]),
);

/**
 * Runs a command; wall time from here, CPU time (user + system of the child) from bash's `times`,
 * which stays meaningful when other work shares the machine.
 */
function timed(command: string, args: string[], extraEnv: Record<string, string> = {}) {
  const quoted = [command, ...args].map((a) => `'${a.replace(/'/g, "'\\''")}'`).join(' ');
  const script = `${quoted} > "$OUT" 2> "$ERR"; status=$?; times; exit $status`;
  const dir = mkdtempSync(join(tmpdir(), 'bench-fit-'));
  const env = { ...process.env, ...extraEnv, OUT: join(dir, 'out'), ERR: join(dir, 'err') };
  const t0 = process.hrtime.bigint();
  const r = spawnSync('bash', ['-c', script], { cwd: root, encoding: 'utf8', env });
  const seconds = Number(process.hrtime.bigint() - t0) / 1e9;
  const stdout = readFileSync(env.OUT, 'utf8');
  const stderr = readFileSync(env.ERR, 'utf8');
  rmSync(dir, { recursive: true });
  if (r.status !== 0) throw new Error(`${command} ${args.join(' ')} failed: ${stderr}`);
  // second line of `times`: children's user and system time, e.g. "0m1.234s 0m0.210s"
  const child = r.stdout.trim().split('\n')[1] ?? '';
  const cpu = [...child.matchAll(/(\d+)m([\d.]+)s/g)].reduce(
    (t, m) => t + 60 * Number(m[1]) + Number(m[2]),
    0,
  );
  return { seconds, cpu, stdout, stderr };
}

line(
  `load average at start: ${loadavg()
    .map((x) => x.toFixed(1))
    .join(
      ' / ',
    )} (1 / 5 / 15 min) on ${availableParallelism()} cores — other work on the machine slows the wall-clock figures`,
);

// 1–2. whole process and loop, through the installed entry point (bin/bellwether.js runs the
// bundled command, made once by esbuild; the first call below makes it if the sources changed)
const file = join(fixtures, 'bell-5000.json');
timed(process.execPath, ['bin/bellwether.js', '--help']);
const startupRuns = Array.from({ length: REPEATS }, () =>
  timed(process.execPath, ['bin/bellwether.js', '--help']),
);
const startup = median(startupRuns.map((r) => r.seconds));
const startupCpu = median(startupRuns.map((r) => r.cpu));
// the whole process five times: a single run on this shared machine varies by ±25 %
const WHOLE_REPEATS = 5;
const runs = Array.from({ length: WHOLE_REPEATS }, () =>
  timed(process.execPath, ['bin/bellwether.js', 'fit', file, '--model', 'bell', '--timing']),
);
const loopRates = runs.map((r) => Number(/fits_per_s=(\d+)/.exec(r.stderr)?.[1]));
const n = Number(/ n=(\d+)/.exec(runs[0].stderr)?.[1]);
const whole = median(runs.map((r) => r.seconds));
const wholeCpu = median(runs.map((r) => r.cpu));
const viaNpm = timed('npm', ['run', '--silent', 'bellwether', '--', 'fit', file, '--timing']).seconds;
// the same run with every profile through the JavaScript engine instead of the WebAssembly kernel
const engineRuns = Array.from({ length: REPEATS }, () =>
  timed(process.execPath, ['bin/bellwether.js', 'fit', file, '--model', 'bell', '--timing'], {
    BELLWETHER_FIT_ENGINE: 'js',
  }),
);
const engineWhole = median(engineRuns.map((r) => r.seconds));
const engineLoop = median(engineRuns.map((r) => Number(/fits_per_s=(\d+)/.exec(r.stderr)?.[1])));
// Node.js itself, doing nothing: the floor under any whole-process figure on this machine
const bare = median(Array.from({ length: REPEATS }, () => timed(process.execPath, ['-e', '0']).seconds));
const results = JSON.parse(runs[0].stdout).results as (Ref & { converged: boolean })[];
let agree = 0;
for (const r of results) {
  const e = exact.get(r.id);
  if (!e || r.V === null || r.pKa1 === null || r.pKa2 === null) continue;
  const worst = Math.max(
    ...(['V', 'pKa1', 'pKa2'] as const).map((k) => Math.abs(r[k] - e[k]) / Math.abs(e[k])),
  );
  if (worst <= 1e-6) agree++;
}

line(
  `bell model, bell-5000.json (${n} profiles), median of ${WHOLE_REPEATS} runs of bin/bellwether.js fit --timing`,
);
line(`  fitting loop:   ${median(loopRates)} fits/s        (scipy ≈ 1,280; R ≈ 510)`);
const wholeTimes = runs.map((r) => r.seconds);
line(
  `  whole process:  ${Math.round(n / whole)} fits/s  (${whole.toFixed(2)} s, runs ${Math.min(...wholeTimes).toFixed(2)}–${Math.max(...wholeTimes).toFixed(2)} s; scipy ≈ 1,100; R ≈ 405)`,
);
line(
  `  ratio to scipy: loop ${(median(loopRates) / 1280).toFixed(1)}×, whole process ${(n / whole / 1100).toFixed(1)}×`,
);
line(
  `  start-up alone (bin/bellwether.js --help): ${startup.toFixed(2)} s; via npm run: ${viaNpm.toFixed(2)} s for the whole fit (npm's own start-up included)`,
);
line(`  whole process without the start-up: ${Math.round(n / (whole - startup))} fits/s`);
line(`  Node.js alone (node -e 0): ${bare.toFixed(2)} s`);
line(
  `  the same through the JavaScript engine only (BELLWETHER_FIT_ENGINE=js): loop ${engineLoop} fits/s, whole process ${Math.round(n / engineWhole)} fits/s (${engineWhole.toFixed(2)} s, ${(n / engineWhole / 1100).toFixed(1)}× scipy)`,
);
line(
  `  CPU time of the whole process: ${wholeCpu.toFixed(2)} s → ${Math.round(n / wholeCpu)} fits per CPU-second; start-up alone ${startupCpu.toFixed(2)} s CPU; fitting ${Math.round(n / (wholeCpu - startupCpu))} fits per CPU-second`,
);
line(
  `  agreement with bell-5000.exact.json: ${agree}/${exact.size} within 1e-6 (${((100 * agree) / exact.size).toFixed(2)} %)`,
);

// 3. bootstrap
const s00000 = (
  JSON.parse(readFileSync(join(fixtures, 'bell-200.json'), 'utf8')).datasets as { id: string }[]
).find((d) => d.id === 's1-00000');
const bootTimes: number[] = [];
for (let i = 0; i < 5; i++) {
  const t0 = performance.now();
  const r = fitProfile(s00000 as never, { profile: false, alternative: false, bootstrap: 1000 });
  bootTimes.push((performance.now() - t0) / 1000);
  if (!r.ok || r.value.bootstrap?.resamples !== 1000) throw new Error('bootstrap failed');
}
line(
  `bootstrap, 1,000 resamples of bell-200 s1-00000 (fit included), median of 5: ${median(bootTimes).toFixed(3)} s (target < 0.2 s)`,
);

// 4. NIST digits: Bellwether's solver and ml-levenberg-marquardt
let worstParam = 15;
let worstSD = 15;
let worstRSS = 15;
let mlPass = 0;
let mlDefaultPass = 0;
const mlTimes: number[] = [];
for (const name of NIST_NAMES) {
  const p = readNist(name);
  const names = p.certified.map((_, j) => `b${j + 1}`);
  for (const start of [p.start1, p.start2]) {
    const fit = fitCurve({ x: p.x, y: p.y }, { names, f: p.f }, { start, probe: false });
    if (!fit.ok) throw new Error(fit.error.message);
    p.certified.forEach((c, j) => {
      worstParam = Math.min(worstParam, lre(c, fit.value.parameters[names[j]].value as number));
      worstSD = Math.min(worstSD, lre(p.certifiedSD[j], fit.value.parameters[names[j]].se as number));
    });
    worstRSS = Math.min(worstRSS, lre(p.certifiedRSS, fit.value.ssr as number));
    const model = (b: number[]) => (x: number) => p.f(x, b);
    const t0 = performance.now();
    const tight = mlLevenbergMarquardt({ x: p.x, y: p.y }, model, {
      initialValues: start,
      damping: 1e-3,
      centralDifference: true,
      gradientDifference: start.map((v) => 1e-6 * Math.abs(v)),
      maxIterations: 10000,
      errorTolerance: 0,
      improvementThreshold: 1e-12,
    });
    mlTimes.push(performance.now() - t0);
    if (Math.min(...p.certified.map((c, j) => lre(c, tight.parameterValues[j]))) >= 6) mlPass++;
    try {
      const plain = mlLevenbergMarquardt({ x: p.x, y: p.y }, model, { initialValues: start });
      if (Math.min(...p.certified.map((c, j) => lre(c, plain.parameterValues[j]))) >= 6) mlDefaultPass++;
    } catch {
      // counted as a miss
    }
  }
}
line(`NIST StRD, ${NIST_NAMES.length} problems × 2 starts, Bellwether (central differences):`);
line(
  `  fewest digits: parameters ${worstParam.toFixed(1)}, standard deviations ${worstSD.toFixed(1)}, RSS ${worstRSS.toFixed(1)}`,
);
line(
  `ml-levenberg-marquardt 5.1 on the same 20 runs: ${mlDefaultPass}/20 reach 6 digits with its defaults, ${mlPass}/20 with tight settings`,
);
line(
  `  (tight: central differences, relative steps 1e-6, damping 1e-3, 10,000 iterations; median ${median(mlTimes).toFixed(0)} ms per run)`,
);

// ml-levenberg-marquardt on bell-200 from scipy's starting values, analytic Jacobian
type Data = { id: string; pH: number[]; v: number[] };
const data200 = JSON.parse(readFileSync(join(fixtures, 'bell-200.json'), 'utf8')).datasets as Data[];
const scipy200 = JSON.parse(readFileSync(join(fixtures, 'bell-200.scipy.json'), 'utf8')).results as {
  start: { V: number; pKa1: number; pKa2: number };
}[];
const exact200 = new Map(
  (JSON.parse(readFileSync(join(fixtures, 'bell-200.exact.json'), 'utf8')).results as Ref[]).map((r) => [
    r.id,
    r,
  ]),
);
const bell =
  ([V, a, b]: number[]) =>
  (x: number) =>
    V / (1 + 10 ** (a - x) + 10 ** (x - b));
const bellJacobian =
  ([V, a, b]: number[]) =>
  (x: number) => {
    const u = 10 ** (a - x);
    const w = 10 ** (x - b);
    const D = 1 + u + w;
    return [1 / D, (-V * u * Math.LN10) / (D * D), (V * w * Math.LN10) / (D * D)];
  };
let mlAgree = 0;
const t0 = performance.now();
data200.forEach((d, i) => {
  const e = exact200.get(d.id);
  const s = scipy200[i].start;
  let values: number[] | null = null;
  try {
    values = mlLevenbergMarquardt({ x: d.pH, y: d.v }, bell, {
      initialValues: [s.V, s.pKa1, s.pKa2],
      jacobianFunction: bellJacobian,
      damping: 1e-3,
      maxIterations: 100,
      errorTolerance: 0,
      improvementThreshold: 1e-12,
    } as never).parameterValues;
  } catch {
    values = null;
  }
  if (!e || !values) return;
  const worst = Math.max(
    ...[e.V, e.pKa1, e.pKa2].map((c, j) => Math.abs((values as number[])[j] - c) / Math.abs(c)),
  );
  if (worst <= 1e-6) mlAgree++;
});
const mlRate = data200.length / ((performance.now() - t0) / 1000);
line(
  `ml-levenberg-marquardt on bell-200 (analytic Jacobian, scipy's starts, 100 iterations): ${mlAgree}/${exact200.size} within 1e-6 of the exact minima (${((100 * mlAgree) / exact200.size).toFixed(1)} %), ${Math.round(mlRate)} fits/s`,
);
