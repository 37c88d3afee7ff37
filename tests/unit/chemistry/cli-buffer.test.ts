// The `buffer` command, spawned as a user runs it: `node bin/bellwether.js buffer ...` (what
// `npm run bellwether -- buffer ...` runs).
// All runs start together in beforeAll (each process takes a second or two to start).
import { execFile } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { beforeAll, describe, expect, it, vi } from 'vitest';
import { run } from '../../../server/cli/buffer';

const root = fileURLToPath(new URL('../../..', import.meta.url));

interface Run {
  code: number;
  stdout: string;
  stderr: string;
}

function bellwether(args: string[]): Promise<Run> {
  return new Promise((resolve) => {
    execFile(
      process.execPath,
      ['bin/bellwether.js', ...args],
      { cwd: root, timeout: 120_000 },
      (error, stdout, stderr) => {
        const code = error ? (typeof error.code === 'number' ? error.code : 1) : 0;
        resolve({ code, stdout, stderr });
      },
    );
  });
}

const commands = {
  help: ['buffer', '--help'],
  list: ['buffer', 'list'],
  listJson: ['buffer', 'list', '--temp', '37', '--json'],
  phosphate: [
    'buffer',
    'recipe',
    '--system',
    'sodium-phosphate',
    '--ph',
    '7',
    '--temp',
    '25',
    '--conc',
    '100',
    '--volume',
    '1000',
    '--method',
    'mix',
    '--json',
  ],
  trisSheet: [
    'buffer',
    'recipe',
    '--system',
    'tris',
    '--ph',
    '8',
    '--temp',
    '25',
    '--conc',
    '50',
    '--volume',
    '1000',
  ],
  capacityRange: [
    'buffer',
    'capacity',
    '--system',
    'acetate',
    '--ph-range',
    '4:5.5:0.5',
    '--temp',
    '25',
    '--conc',
    '100',
  ],
  unknown: [
    'buffer',
    'recipe',
    '--system',
    'no-such-buffer',
    '--ph',
    '7',
    '--temp',
    '25',
    '--conc',
    '50',
    '--volume',
    '100',
  ],
  pH15: [
    'buffer',
    'recipe',
    '--system',
    'hepes',
    '--ph',
    '15',
    '--temp',
    '25',
    '--conc',
    '50',
    '--volume',
    '100',
  ],
} satisfies Record<string, string[]>;

const runs = {} as Record<keyof typeof commands, Run>;

beforeAll(async () => {
  const entries = Object.entries(commands) as [keyof typeof commands, string[]][];
  const results = await Promise.all(entries.map(([, args]) => bellwether(args)));
  entries.forEach(([name], i) => (runs[name] = results[i]));
}, 180_000);

describe('bellwether buffer (command line)', () => {
  it('--help prints the usage and exits 0', () => {
    expect(runs.help.code).toBe(0);
    expect(runs.help.stdout).toMatch(/buffer recipe --system NAME --ph X --temp C --conc mM --volume mL/);
    expect(runs.help.stdout).toMatch(/--ph-range FROM:TO/);
  });

  it('list prints a table of the library with sources', () => {
    expect(runs.list.code).toBe(0);
    expect(runs.list.stdout).toMatch(
      /^hepes\s+HEPES\s+pKa\s+7\.564\s+0\s+-0\.0120\s+6\.56–8\.56\s+G; VB 7\.565$/m,
    ); // SCIENCE.md §2.5
    expect(runs.list.stdout).toMatch(/35 systems/);
  });

  it('list --json gives every system with its pKa at the temperature asked', () => {
    expect(runs.listJson.code).toBe(0);
    const data = JSON.parse(runs.listJson.stdout);
    expect(data.temperatureC).toBe(37);
    const tris = data.systems.find((s: { id: string }) => s.id === 'tris');
    expect(tris.pKaAtTemperature[0]).toBeCloseTo(7.753, 3); // SCIENCE.md §2.1
  });

  it('recipe --json reproduces the phosphate worked check (SCIENCE.md §2.4)', () => {
    expect(runs.phosphate.code).toBe(0);
    const r = JSON.parse(runs.phosphate.stdout);
    expect(r.ionicStrength).toBeCloseTo(0.2214, 4);
    expect(r.ionization.pKapp).toBeCloseTo(6.811, 3);
    expect(r.baseFraction).toBeCloseTo(0.607, 4);
    expect(r.capacity.total).toBeCloseTo(0.0549, 4);
  });

  it('recipe prints a recipe sheet: components, titrant volume, steps and cautions', () => {
    expect(runs.trisSheet.code).toBe(0);
    const out = runs.trisSheet.stdout;
    expect(out).toMatch(/pK″ 8\.142 at I = 0\.02904 M/); // SCIENCE.md §2.4: I 0.0290, pK″ 8.142
    expect(out).toMatch(/^HCl\s+HCl\s+29\.04 mmol\s+29\.04 mL\s+1\.000 M$/m); // HCl 29.04 mmol/L
    expect(out).toMatch(/Steps:\n\s+1\. Weigh 6\.057 g of Tris base/);
    expect(out).toMatch(/eye protection/);
  });

  it('capacity --ph-range prints a table of β against pH', () => {
    expect(runs.capacityRange.code).toBe(0);
    const rows = runs.capacityRange.stdout.split('\n').filter((l) => /^\d\.\d\d\s/.test(l));
    expect(rows.map((r) => r.split(/\s+/)[0])).toEqual(['4.00', '4.50', '5.00', '5.50']);
    expect(runs.capacityRange.stdout).toMatch(/^5\.00\s+49\.6/m); // SCIENCE.md §2.4: acetate pH 5.00, β 0.0496 M/pH
  });

  it.each([
    ['unknown', /Unknown buffer system "no-such-buffer"/],
    ['pH15', /pH 15 is outside 0–14/],
  ] as const)('a bad argument (%s) exits 2 with a clear message on stderr', (name, message) => {
    expect(runs[name].code).toBe(2);
    expect(runs[name].stderr).toMatch(message);
    expect(runs[name].stdout).toBe('');
  });
});

// The same module called in-process (no spawn) for the remaining argument checks.
async function inProcess(args: string[]): Promise<Run> {
  let stdout = '';
  let stderr = '';
  const out = vi
    .spyOn(process.stdout, 'write')
    .mockImplementation((chunk) => ((stdout += String(chunk)), true));
  const err = vi
    .spyOn(process.stderr, 'write')
    .mockImplementation((chunk) => ((stderr += String(chunk)), true));
  try {
    const code = await run(args);
    return { code, stdout, stderr };
  } finally {
    out.mockRestore();
    err.mockRestore();
  }
}

describe('bellwether buffer, argument checks (in-process)', () => {
  const base = ['--system', 'hepes', '--temp', '25', '--conc', '50'];

  it('capacity --json gives β for one pH (SCIENCE.md §2.4: HEPES 0.0288 M/pH)', async () => {
    const r = await inProcess(['capacity', ...base, '--ph', '7.5', '--json']);
    expect(r.code).toBe(0);
    expect(JSON.parse(r.stdout).capacity).toBeCloseTo(0.0288, 4);
  });

  it.each([
    ['a missing --ph', ['recipe', ...base, '--volume', '100'], /missing --ph/],
    ['a missing --volume', ['recipe', ...base, '--ph', '7.5'], /missing --volume/],
    ['an unknown option', ['capacity', ...base, '--ph', '7', '--colour', 'red'], /unknown option '--colour'/],
    [
      'a word for a number',
      ['recipe', ...base, '--ph', 'seven', '--volume', '100'],
      /--ph expects a number, not 'seven'/,
    ],
    [
      'an unknown method',
      ['recipe', ...base, '--ph', '7', '--volume', '100', '--method', 'shake'],
      /--method must be one of mix, titrate/,
    ],
    ['a malformed range', ['capacity', ...base, '--ph-range', '6-8'], /--ph-range expects FROM:TO/],
    ['both --ph and --ph-range', ['capacity', ...base, '--ph', '7', '--ph-range', '6:8'], /not both/],
    [
      'a negative concentration',
      ['recipe', '--system', 'hepes', '--temp', '25', '--conc', '-5', '--ph', '7.5', '--volume', '100'],
      /cannot be negative/,
    ],
    [
      'a temperature of 120 °C',
      ['recipe', '--system', 'hepes', '--temp', '120', '--conc', '50', '--ph', '7.5', '--volume', '100'],
      /outside 0–100 °C/,
    ],
    ['an unknown subcommand', ['brew'], /unknown subcommand 'brew'/],
    ['a value missing after an option', ['recipe', ...base, '--ph'], /--ph needs a value/],
  ])('%s exits 2 with a message', async (_label, args, message) => {
    const r = await inProcess(args);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(message);
    expect(r.stdout).toBe('');
  });

  it('a pH the system cannot buffer exits 1 and says why', async () => {
    const r = await inProcess(['recipe', ...base, '--ph', '4', '--volume', '100']);
    expect(r.code).toBe(1);
    expect(r.stderr).toMatch(/would not buffer there/);
  });

  it('no subcommand prints the usage and exits 2', async () => {
    const r = await inProcess([]);
    expect(r.code).toBe(2);
    expect(r.stdout).toMatch(/usage: bellwether buffer/);
  });
});
