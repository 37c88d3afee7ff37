// `bellwether buffer list | recipe | capacity` — the buffer chemistry of shared/chemistry on the
// command line. Human-readable tables by default, JSON with --json (stdout); messages on stderr.
// Exit codes: 0 done, 2 bad arguments or input (unknown system, missing --ph, pH 15 …),
// 1 a well-formed request the chemistry refuses (pH too far from every pKa, impossible recipe).
import {
  bufferCapacity,
  bufferLibrary,
  bufferPKas,
  capacityCurve,
  findBufferSystem,
  makeRecipe,
  type ActivityModel,
  type BufferSystem,
  type CapacityPoint,
  type ChemError,
  type Recipe,
  type RecipeInput,
} from '@shared/chemistry';

const usage = `usage: bellwether buffer <list|recipe|capacity> [options]

  buffer list [--temp C] [--json]
      The buffer library: pKa values at 25 °C (and at C), charges, dpKa/dT, useful ranges, sources.

  buffer recipe --system NAME --ph X --temp C --conc mM --volume mL
                [--method mix|titrate] [--ionic-strength M] [--salt NaCl|KCl] [--salt-conc mM]
                [--titrant NaOH|KOH|HCl] [--titrant-conc M] [--activity davies|edh|ideal] [--json]
      Amounts to make the buffer at pH X and C °C: two forms mixed, or one form titrated.
      --ionic-strength tops the final solution up to M with salt (NaCl unless --salt KCl).

  buffer capacity --system NAME (--ph X | --ph-range FROM:TO[:STEP]) --temp C --conc mM
                [--ionic-strength M] [--activity davies|edh|ideal] [--json]
      Buffer capacity β (M per pH unit) of the buffer made up at each pH; a range prints a table.

  NAME is an id, name or alias from 'buffer list' (e.g. hepes, tris, sodium-phosphate).
`;

type Options = Record<string, string | true>;

const VALUE_OPTIONS: Record<string, string[]> = {
  list: ['temp'],
  recipe: [
    'system',
    'ph',
    'temp',
    'conc',
    'volume',
    'method',
    'ionic-strength',
    'salt',
    'salt-conc',
    'titrant',
    'titrant-conc',
    'activity',
  ],
  capacity: ['system', 'ph', 'ph-range', 'temp', 'conc', 'ionic-strength', 'activity'],
};

class UsageError extends Error {}

function parseOptions(sub: string, args: string[]): Options {
  const allowed = VALUE_OPTIONS[sub];
  const options: Options = {};
  for (let i = 0; i < args.length; i++) {
    const arg = args[i];
    if (!arg.startsWith('--')) throw new UsageError(`unexpected argument '${arg}'`);
    const [name, inline] = arg.slice(2).split(/=(.*)/s, 2);
    if (name === 'json' || name === 'help') {
      options[name] = true;
      continue;
    }
    if (!allowed.includes(name)) throw new UsageError(`unknown option '--${name}' for 'buffer ${sub}'`);
    const value = inline ?? args[++i];
    if (value === undefined || (inline === undefined && value.startsWith('--'))) {
      throw new UsageError(`--${name} needs a value`);
    }
    options[name] = value;
  }
  return options;
}

function text(options: Options, name: string, required: true): string;
function text(options: Options, name: string, required?: false): string | undefined;
function text(options: Options, name: string, required = false): string | undefined {
  const value = options[name];
  if (value === undefined) {
    if (required) throw new UsageError(`missing --${name}`);
    return undefined;
  }
  return String(value);
}

function number(options: Options, name: string, required: true): number;
function number(options: Options, name: string, required?: false): number | undefined;
function number(options: Options, name: string, required = false): number | undefined {
  const value = required ? text(options, name, true) : text(options, name);
  if (value === undefined) return undefined;
  const x = Number(value);
  if (value.trim() === '' || !Number.isFinite(x))
    throw new UsageError(`--${name} expects a number, not '${value}'`);
  return x;
}

function choice<T extends string>(options: Options, name: string, allowed: readonly T[]): T | undefined {
  const value = text(options, name);
  if (value === undefined) return undefined;
  if (!allowed.includes(value as T))
    throw new UsageError(`--${name} must be one of ${allowed.join(', ')}, not '${value}'`);
  return value as T;
}

function activity(options: Options): ActivityModel | undefined {
  const value = choice(options, 'activity', ['davies', 'edh', 'extended-debye-huckel', 'ideal'] as const);
  return value === 'edh' ? 'extended-debye-huckel' : value;
}

/** Errors from bad input exit 2 (like a usage error); refusals of the chemistry exit 1. */
const INPUT_ERRORS = new Set([
  'invalid-input',
  'negative-concentration',
  'ph-out-of-range',
  'temperature-out-of-range',
  'unknown-buffer',
  'unknown-form',
]);

function refuse(error: ChemError): number {
  process.stderr.write(`bellwether buffer: ${error.message}\n`);
  return INPUT_ERRORS.has(error.code) ? 2 : 1;
}

const out = (s: string) => process.stdout.write(s.endsWith('\n') ? s : `${s}\n`);
const json = (value: unknown) => out(JSON.stringify(value, null, 2));

const fix = (x: number, d: number) => x.toFixed(d);
function sig(x: number, digits = 4): string {
  if (x === 0 || !Number.isFinite(x)) return String(x);
  const decimals = Math.max(0, digits - 1 - Math.floor(Math.log10(Math.abs(x))));
  return x.toFixed(Math.min(decimals, 10));
}

/** Columns: left-aligned text, right-aligned numbers (every cell given as text). */
function table(header: string[], rows: string[][], numeric: boolean[]): string {
  const widths = header.map((h, c) => Math.max(h.length, ...rows.map((r) => r[c].length)));
  const line = (cells: string[]) =>
    cells
      .map((cell, c) => (numeric[c] ? cell.padStart(widths[c]) : cell.padEnd(widths[c])))
      .join('  ')
      .trimEnd();
  return [line(header), line(widths.map((w) => '-'.repeat(w))), ...rows.map(line)].join('\n');
}

// ---- buffer list -------------------------------------------------------------------------------

function list(options: Options): number {
  const temperatureC = number(options, 'temp') ?? 25;
  const systems: (BufferSystem & { pKaAtTemperature: number[] })[] = [];
  for (const system of bufferLibrary) {
    const r = bufferPKas({ system, temperatureC });
    if (!r.ok) return refuse(r.error);
    systems.push({ ...system, pKaAtTemperature: r.value.steps.map((s) => s.pKa) });
  }
  if (options.json) {
    json({ temperatureC, systems });
    return 0;
  }
  const atT = temperatureC === 25 ? [] : [`pKa ${temperatureC} °C`];
  const rows = systems.flatMap((s) =>
    s.ionizations.map((ion, i) => [
      i === 0 ? s.id : '',
      i === 0 ? s.name : '',
      ion.label,
      String(ion.pKa25),
      ...(atT.length ? [fix(s.pKaAtTemperature[i], 3)] : []),
      ion.zAcid > 0 ? `+${ion.zAcid}` : String(ion.zAcid),
      ion.dpKadT === null ? '–' : fix(ion.dpKadT, 4),
      `${fix(ion.usefulRange[0], 2)}–${fix(ion.usefulRange[1], 2)}`,
      ion.sources.row,
    ]),
  );
  const header = ['id', 'name', 'step', 'pKa 25 °C', ...atT, 'z(HA)', 'dpKa/dT', 'useful pH', 'source'];
  const numeric = [false, false, false, true, ...atT.map(() => true), true, true, false, false];
  out(table(header, rows, numeric));
  out(`\n${systems.length} systems. pKa thermodynamic (I = 0); sources as in SCIENCE.md §2.5. JSON: --json`);
  return 0;
}

// ---- buffer recipe -----------------------------------------------------------------------------

function recipe(options: Options): number {
  const input: RecipeInput = {
    system: text(options, 'system', true),
    pH: number(options, 'ph', true),
    temperatureC: number(options, 'temp', true),
    totalConc: number(options, 'conc', true) / 1000,
    volume: number(options, 'volume', true) / 1000,
    method: choice(options, 'method', ['mix', 'titrate'] as const),
    targetIonicStrength: number(options, 'ionic-strength'),
    salt: choice(options, 'salt', ['NaCl', 'KCl'] as const),
    saltConc: ((mM) => (mM === undefined ? undefined : mM / 1000))(number(options, 'salt-conc')),
    titrant: choice(options, 'titrant', ['NaOH', 'KOH', 'HCl'] as const),
    titrantConc: number(options, 'titrant-conc'),
    activityModel: activity(options),
  };
  const r = makeRecipe(input);
  if (!r.ok) return refuse(r.error);
  if (options.json) json(r.value);
  else out(recipeSheet(r.value));
  return 0;
}

function recipeSheet(r: Recipe): string {
  const how = r.method === 'mix' ? 'mixing two forms' : 'titrating one form';
  const ion = r.ionization;
  const lines = [
    `${r.systemName} (${r.systemId}): ${sig(r.totalConc * 1000)} mM, pH ${fix(r.targetPH, 2)} at ${r.temperatureC} °C, ${sig(r.volume * 1000)} mL, by ${how}`,
    `${ion.label} ${ion.pKa25} (25 °C, I = 0) → ${fix(ion.pKa, 3)} at ${r.temperatureC} °C → pK″ ${fix(ion.pKapp, 3)} at I = ${sig(r.ionicStrength)} M (${r.activityModel})`,
    '',
  ];
  const rows = r.components.map((c) => [
    c.name,
    c.formula ?? '',
    c.formulaWeight === null ? '' : fix(c.formulaWeight, 3),
    `${sig(c.moles * 1000)} mmol`,
    c.grams === null ? '' : `${sig(c.grams)} g`,
    c.volume === null ? '' : `${sig(c.volume * 1000)} mL`,
    c.stockConc === null ? '' : `${sig(c.stockConc)} M`,
  ]);
  lines.push(
    table(['component', 'formula', 'g/mol', 'amount', 'mass', 'volume', 'stock'], rows, [
      false,
      false,
      true,
      true,
      true,
      true,
      true,
    ]),
  );
  const ions = Object.entries(r.counterIons)
    .filter(([, c]) => (c ?? 0) > 0)
    .map(([ion, c]) => `${ion} ${sig((c ?? 0) * 1000)} mM`)
    .join(', ');
  const species = r.species
    .map((s) => `${s.charge > 0 ? '+' : ''}${s.charge}: ${sig(s.conc * 1000)} mM`)
    .join('; ');
  lines.push(
    '',
    `Ionic strength ${sig(r.ionicStrength)} M; strong ions ${ions || 'none'}${r.saltConc > 0 ? ` (salt ${sig(r.saltConc * 1000)} mM)` : ''}`,
    `Buffer species by charge: ${species}`,
    `Buffer capacity β = ${sig(r.capacity.total)} M/pH`,
    '',
    'Steps:',
    ...r.steps.map((s, i) => `  ${i + 1}. ${s}`),
    '',
    'Cautions:',
    ...r.cautions.map((c) => `  - ${c}`),
    ...(r.warnings.length ? ['', 'Warnings:', ...r.warnings.map((w) => `  - ${w}`)] : []),
  );
  return lines.join('\n');
}

// ---- buffer capacity ---------------------------------------------------------------------------

function parseRange(value: string): { pHFrom: number; pHTo: number; step: number } {
  const parts = value.split(':').map((p) => Number(p));
  if ((parts.length !== 2 && parts.length !== 3) || parts.some((p) => !Number.isFinite(p))) {
    throw new UsageError(`--ph-range expects FROM:TO or FROM:TO:STEP, e.g. 6:8:0.25, not '${value}'`);
  }
  return { pHFrom: parts[0], pHTo: parts[1], step: parts[2] ?? 0.25 };
}

function capacity(options: Options): number {
  const range = text(options, 'ph-range');
  if (range !== undefined && options.ph !== undefined)
    throw new UsageError('give --ph or --ph-range, not both');
  if (range === undefined && options.ph === undefined)
    throw new UsageError('missing --ph (or --ph-range FROM:TO[:STEP])');
  const common = {
    system: text(options, 'system', true),
    temperatureC: number(options, 'temp', true),
    totalConc: number(options, 'conc', true) / 1000,
    ionicStrength: number(options, 'ionic-strength'),
    activityModel: activity(options),
  };
  if (range === undefined) {
    const r = bufferCapacity({ ...common, pH: number(options, 'ph', true) });
    if (!r.ok) return refuse(r.error);
    if (options.json) json(r.value);
    else out(capacityTable(common.system, common.temperatureC, common.totalConc, [r.value]));
    return 0;
  }
  const r = capacityCurve({ ...common, ...parseRange(range) });
  if (!r.ok) return refuse(r.error);
  if (options.json) json({ points: r.value });
  else out(capacityTable(common.system, common.temperatureC, common.totalConc, r.value));
  return 0;
}

function capacityTable(ref: string, temperatureC: number, C: number, points: CapacityPoint[]): string {
  const system = findBufferSystem(ref)?.name ?? ref;
  const rows = points.map((p) => [
    fix(p.pH, 2),
    sig(p.capacity * 1000),
    sig(p.bufferCapacity * 1000),
    sig(p.waterCapacity * 1000, 2),
    fix(100 * p.relative, 1),
    sig(p.ionicStrength),
    p.pKapp.map((k) => fix(k, 3)).join(', '),
    p.outsideRange ? 'outside useful range' : '',
  ]);
  const header = ['pH', 'β mM/pH', 'buffer', 'water', '% of peak', 'I (M)', 'pK″', 'note'];
  return [
    `Buffer capacity of ${system}, ${sig(C * 1000)} mM at ${temperatureC} °C (each pH: the buffer made up at that pH).`,
    `Peak of the buffer term: ln10·C/4 = ${sig(((Math.LN10 * C) / 4) * 1000)} mM/pH.`,
    '',
    table(header, rows, [true, true, true, true, true, true, false, false]),
  ].join('\n');
}

// ---- entry point -------------------------------------------------------------------------------

const SUBCOMMANDS: Record<string, (options: Options) => number> = { list, recipe, capacity };

export async function run(args: string[]): Promise<number> {
  const [sub, ...rest] = args;
  if (!sub || sub === '--help' || sub === '-h' || sub === 'help') {
    process.stdout.write(usage);
    return sub ? 0 : 2;
  }
  const command = SUBCOMMANDS[sub];
  if (!command) {
    process.stderr.write(`bellwether buffer: unknown subcommand '${sub}'\n\n${usage}`);
    return 2;
  }
  try {
    const options = parseOptions(sub, rest);
    if (options.help) {
      process.stdout.write(usage);
      return 0;
    }
    return command(options);
  } catch (error) {
    if (error instanceof UsageError) {
      process.stderr.write(`bellwether buffer ${sub}: ${error.message}\n(see bellwether buffer --help)\n`);
      return 2;
    }
    throw error;
  }
}
