// `npm test`: every check in one run — typecheck, lint, Vitest (unit + integration on a throwaway
// PostgreSQL), production build, Playwright on Debian's Chromium against the built app. It runs
// them all even when one fails, prints a summary, and ends with the one line
//   tests: N passed, N failed
// (Vitest and Playwright tests counted one by one; typecheck, lint and build as one check each).
import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';

type Outcome = { step: string; passed: number; failed: number; note?: string };
const outcomes: Outcome[] = [];
const resultsDir = path.resolve('test-results');
fs.mkdirSync(resultsDir, { recursive: true });
const bin = (name: string) => path.resolve('node_modules/.bin', name);
const only = process.argv.slice(2); // e.g. `npm test -- vitest e2e` runs just those steps

function run(command: string, args: string[], env: NodeJS.ProcessEnv = {}) {
  const started = Date.now();
  const result = spawnSync(command, args, { stdio: 'inherit', env: { ...process.env, ...env } });
  return { ok: result.status === 0, seconds: (Date.now() - started) / 1000 };
}

function step(name: string, body: () => Outcome | void) {
  if (only.length > 0 && !only.includes(name)) return;
  console.log(`\n=== ${name} ===`);
  const outcome = body();
  if (outcome) outcomes.push(outcome);
}

function single(name: string, command: string, args: string[]): Outcome {
  const { ok, seconds } = run(command, args);
  return { step: name, passed: ok ? 1 : 0, failed: ok ? 0 : 1, note: `${seconds.toFixed(0)} s` };
}

function readJson<T>(file: string): T | null {
  try {
    return JSON.parse(fs.readFileSync(file, 'utf8')) as T;
  } catch {
    return null;
  }
}

function ensureChromium(): string | null {
  if (fs.existsSync('/usr/bin/chromium')) return null;
  const isRoot = process.getuid?.() === 0;
  const command = 'apt-get update && DEBIAN_FRONTEND=noninteractive apt-get install -y chromium';
  const runner = isRoot ? ['sh', '-c', command] : spawnSync('sudo', ['-n', 'true']).status === 0 ? ['sudo', '-n', 'sh', '-c', command] : null;
  if (!runner) return `Chromium is missing; install it with: sudo sh -c '${command}'`;
  console.log("Installing Debian's chromium for the browser tests (one time)…");
  spawnSync(runner[0], runner.slice(1), { stdio: 'inherit' });
  return fs.existsSync('/usr/bin/chromium') ? null : 'Installing chromium failed.';
}

step('typecheck', () => single('typecheck', bin('tsc'), ['-p', '.']));
step('lint', () => single('lint', bin('eslint'), ['.', '--max-warnings=0']));

step('vitest', () => {
  const file = path.join(resultsDir, 'vitest.json');
  fs.rmSync(file, { force: true });
  const { ok, seconds } = run(bin('vitest'), ['run', '--reporter=default', '--reporter=json', `--outputFile.json=${file}`]);
  const report = readJson<{ numPassedTests: number; numFailedTests: number }>(file);
  if (!report) return { step: 'vitest', passed: 0, failed: 1, note: 'no report (Vitest could not run)' };
  const failed = report.numFailedTests + (ok || report.numFailedTests > 0 ? 0 : 1);
  return { step: 'vitest', passed: report.numPassedTests, failed, note: `${seconds.toFixed(0)} s` };
});

let built = false;
step('build', () => {
  const outcome = single('build', bin('vite'), ['build', '--logLevel', 'warn']);
  built = outcome.failed === 0;
  return outcome;
});

step('e2e', () => {
  if (!built && !fs.existsSync('dist/client/index.html')) return { step: 'e2e', passed: 0, failed: 1, note: 'no client build' };
  const missing = ensureChromium();
  if (missing) return { step: 'e2e', passed: 0, failed: 1, note: missing };
  const file = path.join(resultsDir, 'playwright.json');
  fs.rmSync(file, { force: true });
  const { ok, seconds } = run(bin('playwright'), ['test', '--reporter=list,json'], { PLAYWRIGHT_JSON_OUTPUT_NAME: file });
  const report = readJson<{ stats: { expected: number; unexpected: number; flaky: number } }>(file);
  if (!report) return { step: 'e2e', passed: 0, failed: 1, note: 'no report (Playwright could not run)' };
  const { expected, unexpected, flaky } = report.stats;
  return { step: 'e2e', passed: expected, failed: unexpected + flaky + (ok || unexpected > 0 ? 0 : 1), note: `${seconds.toFixed(0)} s` };
});

console.log('\n=== summary ===');
for (const o of outcomes) {
  console.log(`${o.step.padEnd(10)} ${String(o.passed).padStart(5)} passed ${String(o.failed).padStart(4)} failed   ${o.note ?? ''}`);
}
const passed = outcomes.reduce((n, o) => n + o.passed, 0);
const failed = outcomes.reduce((n, o) => n + o.failed, 0);
console.log(`tests: ${passed} passed, ${failed} failed`);
process.exit(failed > 0 || outcomes.length === 0 ? 1 : 0);
