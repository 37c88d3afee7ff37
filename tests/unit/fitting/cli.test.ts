import { execFile } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { promisify } from 'node:util';
import { beforeAll, describe, expect, it } from 'vitest';
import { ENGINE_VERSION } from '@shared/fitting';
import { readReference, rel, type RefDataset, type RefFit } from './helpers/reference';

// The `fit` command run as a child process through the installed entry point, as a user runs it
// (`npm run bellwether` runs bin/bellwether.js, which runs the bundled command). Input: three profiles of
// bell-200.json (s1-00000 both limbs, s1-00004 acid limb only, s1-00008 base limb only) and two
// broken ones; expected numbers from bell-200.exact.json and bell-200.scipy.json.
const root = fileURLToPath(new URL('../../..', import.meta.url));
const run = promisify(execFile);
const bell200 = readReference<{ datasets: RefDataset[] }>('bell-200.json').datasets;
const exact = readReference<{ results: RefFit[] }>('bell-200.exact.json').results;
const scipy = readReference<{ results: RefFit[] }>('bell-200.scipy.json').results;
const pick = (id: string) => bell200.find((d) => d.id === id) as RefDataset;

let dir = '';
const file = (name: string, content: string): string => {
  const path = join(dir, name);
  writeFileSync(path, content);
  return path;
};

async function fit(
  args: string[],
  env: Record<string, string> = {},
): Promise<{ code: number; stdout: string; stderr: string }> {
  try {
    const { stdout, stderr } = await run(process.execPath, ['bin/bellwether.js', 'fit', ...args], {
      cwd: root,
      env: { ...process.env, ...env },
      maxBuffer: 64 * 1024 * 1024,
    });
    return { code: 0, stdout, stderr };
  } catch (error) {
    const e = error as { code: number; stdout: string; stderr: string };
    return { code: e.code, stdout: e.stdout, stderr: e.stderr };
  }
}

beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'bellwether-fit-'));
  const datasets = [
    pick('s1-00000'),
    pick('s1-00004'),
    pick('s1-00008'),
    { id: 'short', pH: [4, 5, 6], v: [1, 2] },
    { id: 'gap', pH: [4, 5, 6, 7], v: [1, null, 3, 4] },
  ];
  file('small.json', JSON.stringify({ datasets }));
});

describe('bellwether fit', () => {
  it('writes the results format, field by field, and exits 0', async () => {
    const { code, stdout, stderr } = await fit([join(dir, 'small.json'), '--timing']);
    expect(code).toBe(0);
    expect(stderr).toMatch(/^fit_loop_s=\d+(\.\d+)? n=5 fits_per_s=\d+\n$/);
    const out = JSON.parse(stdout);
    expect(out.engine).toEqual({ name: 'bellwether', version: ENGINE_VERSION, model: 'bell' });
    expect(out.results.map((r: { id: string }) => r.id)).toEqual([
      's1-00000',
      's1-00004',
      's1-00008',
      'short',
      'gap',
    ]);

    const [both, acid, base, short, gap] = out.results;
    expect(Object.keys(both)).toEqual([
      'id',
      'model',
      'n',
      'dof',
      'V',
      'pKa1',
      'pKa2',
      'se',
      'pHopt',
      'pHopt_se',
      'ssr',
      'converged',
      'flags',
    ]);
    const ref = exact.find((r) => r.id === 's1-00000') as RefFit;
    expect(both).toMatchObject({ model: 'bell', n: 45, dof: 42, converged: true, flags: [] });
    for (const k of ['V', 'pKa1', 'pKa2', 'pHopt', 'ssr'] as const)
      expect(rel(both[k], ref[k] as number)).toBeLessThan(1e-6);
    for (const k of ['V', 'pKa1', 'pKa2']) expect(rel(both.se[k], ref.se?.[k] as number)).toBeLessThan(1e-5);
    expect(rel(both.pHopt_se, ref.pHopt_se as number)).toBeLessThan(1e-5);

    // one limb: the unseen pKa is null with a flag naming it, pHopt null; V, seen pKa, SSR as scipy's
    const refA = scipy.find((r) => r.id === 's1-00004') as RefFit;
    expect(acid).toMatchObject({ pKa2: null, pHopt: null, pHopt_se: null, converged: true });
    expect(acid.se.pKa2).toBeNull();
    expect(acid.flags).toContain('pKa2_not_determined');
    expect(rel(acid.V, refA.V as number)).toBeLessThan(1e-6);
    expect(rel(acid.pKa1, refA.pKa1 as number)).toBeLessThan(1e-6);
    expect(rel(acid.ssr, refA.ssr as number)).toBeLessThan(1e-8);
    expect(base).toMatchObject({ pKa1: null, pHopt: null });
    expect(base.flags).toContain('pKa1_not_determined');

    // datasets that cannot be fitted: converged false, numbers null, a flag and an error message
    for (const [r, flag] of [
      [short, 'length_mismatch'],
      [gap, 'not_finite'],
    ] as const) {
      expect(r).toMatchObject({
        model: 'bell',
        V: null,
        pKa1: null,
        pKa2: null,
        pHopt: null,
        ssr: null,
        converged: false,
      });
      expect(r.flags).toEqual([flag]);
      expect(typeof r.error).toBe('string');
    }
  });

  it('gives through the WebAssembly kernel what the engine gives (BELLWETHER_FIT_ENGINE=js)', async () => {
    // the first 60 profiles of bell-200, two the engine refuses, one with weights and one longer
    // than the kernel takes (it goes to the engine)
    const long = Array.from({ length: 5000 }, (_, i) => 3 + (6 * i) / 5000);
    const datasets = [
      ...bell200.slice(0, 60),
      { id: 'short', pH: [4, 5, 6], v: [1, 2] },
      { id: 'text', pH: [4, 5, 6, 7], v: [1, '2', 3, 4] },
      { ...pick('s1-00000'), id: 'weighted', w: pick('s1-00000').pH.map((x) => (x < 5 ? 0 : 2)) },
      { id: 'long', pH: long, v: long.map((x) => 100 / (1 + 10 ** (5 - x) + 10 ** (x - 8))) },
      // ids as the reader names them: a number as JavaScript prints it, an escaped string, none
      { ...pick('s1-00001'), id: 7.5 },
      { ...pick('s1-00002'), id: 'a "quoted" id' },
      { pH: pick('s1-00003').pH, v: pick('s1-00003').v },
    ];
    // the kernel reads the ASCII file from its bytes; the other (one character that is not ASCII)
    // goes through JSON.parse
    const path = file('compare.json', JSON.stringify({ datasets }));
    const other = file('compare-utf8.json', JSON.stringify({ note: 'pH 7·5', datasets }));
    const [wasm, js, utf8] = await Promise.all([
      fit([path]),
      fit([path], { BELLWETHER_FIT_ENGINE: 'js' }),
      fit([other]),
    ]);
    expect([wasm.code, js.code, utf8.code]).toEqual([0, 0, 0]);
    expect(utf8.stdout).toBe(wasm.stdout);
    // the two round differently in the last digits, so identical outputs would mean the kernel
    // never ran
    expect(wasm.stdout).not.toBe(js.stdout);
    const a = JSON.parse(wasm.stdout).results as Record<string, unknown>[];
    const b = JSON.parse(js.stdout).results as Record<string, unknown>[];
    expect(a.map((r) => r.id)).toEqual(b.map((r) => r.id));
    a.forEach((r, i) => {
      const e = b[i];
      expect(Object.keys(r), String(r.id)).toEqual(Object.keys(e));
      for (const key of Object.keys(e)) {
        const [x, y] = [r[key], e[key]];
        if (key === 'se') {
          for (const k of Object.keys(y as object)) {
            const [p, q] = [(x as Record<string, number | null>)[k], (y as Record<string, number | null>)[k]];
            expect(p === null, `${String(r.id)} se ${k}`).toBe(q === null);
            if (p !== null && q !== null) expect(rel(p, q), `${String(r.id)} se ${k}`).toBeLessThan(1e-3);
          }
        } else if (typeof y === 'number' && typeof x === 'number' && !Number.isInteger(y)) {
          expect(rel(x, y), `${String(r.id)} ${key}`).toBeLessThan(1e-6);
        } else {
          expect(x, `${String(r.id)} ${key}`).toEqual(y);
        }
      }
    });
  });

  it('fits the one-limb models with pKa in place of pKa1/pKa2, and adds bootstrap fields only when asked', async () => {
    const one = file('one.json', JSON.stringify({ datasets: [pick('s1-00004')] }));
    const plain = JSON.parse((await fit([one, '--model', 'acid'])).stdout).results[0];
    expect(Object.keys(plain)).toEqual([
      'id',
      'model',
      'n',
      'dof',
      'V',
      'pKa',
      'se',
      'pHopt',
      'pHopt_se',
      'ssr',
      'converged',
      'flags',
    ]);
    expect(plain.model).toBe('acid');
    expect(plain.dof).toBe(plain.n - 2);
    const boot = JSON.parse((await fit([one, '--bootstrap', '200'])).stdout).results[0];
    expect(boot.pHopt_ci95_boot).toBeNull(); // one limb: no optimum in the fit or in any resample
    expect(boot.window[0]).toBeCloseTo(boot.pKa1, 12);
    expect(boot.window[1]).toBeNull();
    expect(boot.window_lo_ci95_boot).toHaveLength(2);
    expect(boot.bootstrap).toMatchObject({ resamples: 200, seed: 1 });
  });

  it('proposes a model per dataset with --model auto', async () => {
    const both = file('both.json', JSON.stringify({ datasets: [pick('s1-00000')] }));
    const { code, stdout } = await fit([both, '--model', 'auto']);
    expect(code).toBe(0);
    const out = JSON.parse(stdout);
    expect(out.engine.model).toBe('auto');
    expect(out.results[0].model).toBe('bell');
  });

  it('rejects bad arguments with a message and exit code 2', async () => {
    const bad = [
      [],
      ['x.json', '--model', 'gauss'],
      ['x.json', '--bootstrap', 'many'],
      ['x.json', '--fast'],
      ['a.json', 'b.json'],
    ];
    // run side by side: each is a separate process
    for (const { code, stdout, stderr } of await Promise.all(bad.map((args) => fit(args)))) {
      expect(code).toBe(2);
      expect(stdout).toBe('');
      expect(stderr).toMatch(/^bellwether fit: .+\n\nusage: bellwether fit/);
    }
  });

  it('rejects an unreadable or invalid file with a message and exit code 1', async () => {
    const cases = [
      [join(dir, 'missing.json'), /cannot read .*missing\.json \(ENOENT\)/],
      [file('bad.json', '{ "datasets": [ '), /is not a datasets file: it is not valid JSON/],
      [file('none.json', '{ "profiles": [] }'), /it has no "datasets" array/],
    ] as const;
    const outcomes = await Promise.all(cases.map(([path]) => fit([path])));
    for (const [i, { code, stdout, stderr }] of outcomes.entries()) {
      const message = cases[i][1];
      expect(code).toBe(1);
      expect(stdout).toBe('');
      expect(stderr).toMatch(message);
    }
  });
});
