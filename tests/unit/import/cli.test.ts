// `bellwether parse FILE` as a user runs it: the JSON of /shared/reference/README.md ("Reader
// files") on standard output, key for key; messages on standard error; the exit codes.
import { spawn } from 'node:child_process';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { buildFixtures, FIXTURE_DIR, type Fixture } from '../../fixtures/readers/make-fixtures';

interface Run {
  code: number | null;
  stdout: string;
  stderr: string;
}

function bellwether(...args: string[]): Promise<Run> {
  return new Promise((resolve, reject) => {
    const child = spawn(process.execPath, ['bin/bellwether.js', ...args], {
      cwd: process.cwd(),
      env: { ...process.env, NO_COLOR: '1' },
    });
    let stdout = '';
    let stderr = '';
    child.stdout.on('data', (d: Buffer) => (stdout += d.toString('utf8')));
    child.stderr.on('data', (d: Buffer) => (stderr += d.toString('utf8')));
    child.on('error', reject);
    child.on('close', (code) => resolve({ code, stdout, stderr }));
  });
}

let fixtures: Fixture[];
const runs: Record<string, Run> = {};

beforeAll(async () => {
  fixtures = await buildFixtures();
  // Spawned together: each costs a Node start-up.
  const jobs: [string, string[]][] = [
    ['endpoint', ['parse', join(FIXTURE_DIR, 'endpoint-96-multi.xlsx')]],
    ['kinetic', ['parse', join(FIXTURE_DIR, 'kinetic-mss.csv')]],
    ['nothing', ['parse', join(FIXTURE_DIR, 'nothing-here.csv')]],
    ['missing', ['parse', join(FIXTURE_DIR, 'no-such-file.csv')]],
    ['usage', ['parse']],
  ];
  const results = await Promise.all(jobs.map(([, args]) => bellwether(...args)));
  jobs.forEach(([name], i) => (runs[name] = results[i]));
}, 240_000);

const expectedOf = (name: string) => fixtures.find((f) => f.name === name)!.expected!;

describe('bellwether parse', () => {
  it('prints the end-point blocks of a workbook in the README format, key for key, and exits 0', () => {
    const { code, stdout } = runs.endpoint;
    expect(code).toBe(0);
    const json = JSON.parse(stdout);
    expect(Object.keys(json)).toEqual(['file', 'blocks']);
    expect(json.file).toBe('endpoint-96-multi.xlsx');
    for (const block of json.blocks) {
      expect(Object.keys(block)).toEqual(['kind', 'plateFormat', 'sheet', 'label', 'wells', 'flags']);
      expect(block.kind).toBe('endpoint');
      expect(Object.keys(block.wells)).toHaveLength(96);
      expect(Object.keys(block.wells).slice(0, 13)).toEqual([
        ...Array.from({ length: 12 }, (_, i) => `A${i + 1}`),
        'B1',
      ]);
    }
    // Sheet by sheet, top to bottom (make-fixtures.ts, endpoint96Multi).
    expect(json.blocks.map((b: { sheet: string; label: string }) => [b.sheet, b.label])).toEqual([
      ['Plate 1', 'Read 1: 405'],
      ['Plate 1', 'Absorbance 600 nm'],
      ['Plate 1', 'Read 2: 450 nm'],
      ['Plate 2', 'Abs 340'],
    ]);
    expect(json).toEqual(expectedOf('endpoint-96-multi.xlsx'));
  });

  it('prints kinetic blocks with times_s in seconds, one array per well, 2-space indented', () => {
    const { code, stdout, stderr } = runs.kinetic;
    expect(code).toBe(0);
    const json = JSON.parse(stdout);
    expect(Object.keys(json.blocks[0])).toEqual([
      'kind',
      'plateFormat',
      'sheet',
      'label',
      'times_s',
      'wells',
      'flags',
    ]);
    expect(json.blocks[0].times_s).toEqual([0, 30, 60, 90, 120, 150, 180, 210, 240, 270, 300, 330]); // written as 0:00, 0:30, ... 5:30
    expect(json).toEqual(expectedOf('kinetic-mss.csv'));
    expect(stdout).toMatch(
      /^\{\n {2}"file": "kinetic-mss\.csv",\n {2}"blocks": \[\n {4}\{\n {6}"kind": "kinetic",/,
    );
    expect(stdout).toMatch(/\n {6}"times_s": \[0, 30, 60, /); // number arrays on one line
    expect(stdout.endsWith('}\n')).toBe(true);
    // The skipped temperature column is reported on standard error, not in the JSON.
    expect(stderr).toMatch(/^note: Sheet 'kinetic-mss', cell B3: the temperature column 'Temperature\(°C\)'/);
  });

  it('exits 1 with a message saying what it looked for when nothing is found', () => {
    const { code, stdout, stderr } = runs.nothing;
    expect(code).toBe(1);
    expect(stdout).toBe('');
    expect(stderr).toMatch(
      /^bellwether parse: No reader data was found in its sheet 'nothing-here'\. Bellwether looked for plate grids/,
    );
    expect(stderr).toMatch(/note: .*rows A–D and columns 1–12 is not a whole 96- or 384-well plate/);
  });

  it('exits 1 when the file cannot be opened', () => {
    expect(runs.missing.code).toBe(1);
    expect(runs.missing.stdout).toBe('');
    expect(runs.missing.stderr).toMatch(/^bellwether parse: cannot open '.*no-such-file\.csv': no such file/);
  });

  it('exits 2 with the usage when no file is given', () => {
    expect(runs.usage.code).toBe(2);
    expect(runs.usage.stderr).toMatch(/usage: bellwether parse FILE/);
  });
});
