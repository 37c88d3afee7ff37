/**
 * Helpers for the analysis tests: small hand-made studies (values typed in, for hand-computed checks)
 * and a plain-JSON check. Hand-made values are invented for the tests.
 */
import type { AnalysisInput, AnalysisResult, WellRow } from '../../../shared/analysis';
import type { WellAssignment } from '../../../shared/plate-map';

export type HandWell = Partial<WellAssignment> & Pick<WellAssignment, 'role'> & { value: number | null };

/** A one-plate, 96-well end-point study, absorbance read with ε = 10 000 M⁻¹cm⁻¹ and l = 1 cm. */
export function endpointStudy(
  wells: Record<string, HandWell>,
  overrides: Partial<AnalysisInput> = {},
): AnalysisInput {
  const map: Record<string, WellAssignment> = {};
  const reads: Record<string, { value: number | null; values: null; flag: null }> = {};
  for (const [well, w] of Object.entries(wells)) {
    const { value, ...a } = w;
    map[well] = { variantId: null, pH: null, buffer: null, replicate: null, concentrationUm: null, ...a };
    reads[well] = { value, values: null, flag: null };
  }
  return {
    assay: {
      readMode: 'endpoint',
      detection: 'absorbance',
      quantitation: 'extinction',
      extinctionCoefficient: 10_000,
      extinctionUnit: 'M-1cm-1',
      pathLengthCm: 1,
      wellVolumeUl: 200,
      chromophorePka: null,
      stopSolution: 'NaOH 0.5 M',
      temperatureC: 37,
    },
    variants: [
      { id: 'ref', name: 'Reference', isParent: true, proteinMgPerMl: 1 },
      { id: 'other', name: 'Other', isParent: false, proteinMgPerMl: 1 },
    ],
    referenceVariantId: 'ref',
    plates: [
      {
        id: 'p1',
        name: 'Plate 1',
        format: 96,
        map: { wells: map, replicatesRequired: 3 },
        read: { id: 'r1', kind: 'endpoint', timesS: null, wells: reads },
      },
    ],
    settings: {},
    exclusions: [],
    ...overrides,
  };
}

/** Wells of one value list: role, variant, pH, buffer shared. */
export function series(
  first: { row: string; column: number },
  shared: Omit<HandWell, 'value'>,
  values: (number | null)[],
): Record<string, HandWell> {
  return Object.fromEntries(
    values.map((value, i) => [`${first.row}${first.column + i}`, { ...shared, replicate: i + 1, value }]),
  );
}

/** Paths of every number that is not finite (JSON would turn NaN and ±Infinity into null silently). */
export function nonFinite(value: unknown, path = '$'): string[] {
  if (typeof value === 'number') return Number.isFinite(value) ? [] : [`${path} = ${value}`];
  if (value === null || typeof value !== 'object') {
    return ['function', 'symbol', 'bigint', 'undefined'].includes(typeof value)
      ? [`${path} is ${typeof value}`]
      : [];
  }
  if (ArrayBuffer.isView(value)) return [`${path} is a typed array`];
  return Object.entries(value).flatMap(([k, v]) => nonFinite(v, `${path}.${k}`));
}

export function row(result: AnalysisResult, plateId: string, well: string): WellRow {
  const r = result.wells.find((w) => w.plateId === plateId && w.well === well);
  if (!r) throw new Error(`no row for ${plateId}:${well}`);
  return r;
}
