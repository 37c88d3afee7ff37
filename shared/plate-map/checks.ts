// Checks shown while a plate map is edited (and before analysis): replicates per variant × pH,
// a blank for every pH point, wells without a role, a standard curve when the assay needs one.
import type { PlateFormat } from '../plate/geometry';
import { listWells } from '../plate/geometry';
import type { PlateMap } from './schema';

export type MapCheck = { level: 'error' | 'warning' | 'info'; code: string; message: string; wells: string[] };

export type MapCheckContext = {
  format: PlateFormat;
  variantNames: Record<string, string>;
  needsStandardCurve: boolean;
};

const phKey = (pH: number) => pH.toFixed(2);
const phText = (pH: number) => `pH ${Number(pH.toFixed(2))}`;

export function checkPlateMap(map: PlateMap, context: MapCheckContext): MapCheck[] {
  const checks: MapCheck[] = [];
  const entries = Object.entries(map.wells);
  const samples = entries.filter(([, w]) => w.role === 'sample');

  const incomplete = samples.filter(([, w]) => !w.variantId || w.pH == null).map(([name]) => name);
  if (incomplete.length) {
    checks.push({ level: 'error', code: 'sample_incomplete', message: `${incomplete.length} sample well(s) lack a variant or a pH.`, wells: incomplete });
  }

  const groups = new Map<string, string[]>();
  for (const [name, w] of samples) {
    if (!w.variantId || w.pH == null) continue;
    const key = `${w.variantId}|${phKey(w.pH)}`;
    groups.set(key, [...(groups.get(key) ?? []), name]);
  }
  for (const [key, wells] of groups) {
    if (wells.length >= map.replicatesRequired) continue;
    const [variantId, ph] = key.split('|');
    const variant = context.variantNames[variantId] ?? 'an unknown variant';
    checks.push({
      level: 'warning',
      code: 'too_few_replicates',
      message: `${variant} at ${phText(Number(ph))} has ${wells.length} of ${map.replicatesRequired} replicates.`,
      wells,
    });
  }

  const blanksAt = new Set(entries.filter(([, w]) => w.role === 'blank' && w.pH != null).map(([, w]) => phKey(w.pH!)));
  const samplePhs = [...new Set(samples.filter(([, w]) => w.pH != null).map(([, w]) => phKey(w.pH!)))];
  for (const ph of samplePhs) {
    if (blanksAt.has(ph)) continue;
    const wells = samples.filter(([, w]) => w.pH != null && phKey(w.pH) === ph).map(([n]) => n);
    checks.push({ level: 'error', code: 'missing_blank', message: `${phText(Number(ph))} has samples but no blank without enzyme.`, wells });
  }

  const unknownVariant = samples.filter(([, w]) => w.variantId && !(w.variantId in context.variantNames)).map(([n]) => n);
  if (unknownVariant.length) {
    checks.push({ level: 'error', code: 'unknown_variant', message: `${unknownVariant.length} well(s) name a variant that is not in the study.`, wells: unknownVariant });
  }

  if (context.needsStandardCurve) {
    const levels = new Set(entries.filter(([, w]) => w.role === 'standard' && w.concentrationUm != null).map(([, w]) => w.concentrationUm));
    if (levels.size < 2) {
      checks.push({
        level: 'error',
        code: 'missing_standard_curve',
        message: 'The assay uses a standard curve: add standard wells with at least two concentrations (five or more is better).',
        wells: [],
      });
    }
  }

  const assigned = new Set(Object.keys(map.wells));
  const empty = listWells(context.format).map((w) => w.name).filter((n) => !assigned.has(n));
  if (empty.length) {
    checks.push({ level: 'info', code: 'no_role', message: `${empty.length} well(s) have no role; they are ignored.`, wells: empty });
  }
  return checks;
}
