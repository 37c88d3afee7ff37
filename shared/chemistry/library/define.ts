// Small builders that keep the library data files short: they fill the defaults of the schema,
// compute formula weights from formulas, and the useful range from pKa ± 1.
import { formulaWeight } from '../formula';
import type { RoyEquation } from '../temperature';
import type { BufferForm, Ionization, Titrant } from './schema';
import { DPKADT_SOURCE, USEFUL_RANGE_SOURCE } from './sources';

type FormExtras = Partial<Omit<BufferForm, 'id' | 'name' | 'formula' | 'formulaWeight' | 'counterIons'>> & {
  Na?: number;
  K?: number;
  Cl?: number;
};

export function form(id: string, name: string, formula: string, extras: FormExtras = {}): BufferForm {
  const { Na = 0, K = 0, Cl = 0, ...rest } = extras;
  return {
    id,
    name,
    formula,
    formulaWeight: Math.round(formulaWeight(formula) * 1000) / 1000,
    unitsPerFormula: 1,
    counterIons: { Na, K, Cl },
    state: 'solid',
    density: null,
    note: null,
    ...rest,
  };
}

/** One row of SCIENCE.md §2.5, values as printed. */
export interface TableRow {
  label: string;
  pKa25: number;
  zAcid: number;
  dH: number | null;
  dCp: number | null;
  dpKadT: number;
  /** The row's source cell, verbatim. */
  row: string;
  /** Source of pKa25 / ΔH / ΔCp where they differ from the row's main key. */
  pKaSource: string;
  dHSource?: string;
  dCpSource?: string;
}

export interface IonExtras {
  mix?: [string, string];
  titrate?: [string, Titrant];
  roy?: RoyEquation & { validFromC: number; validToC: number; source: string };
  useRoy?: boolean;
  published?: Ionization['publishedPoints'];
  note?: string;
}

const round4 = (x: number) => Math.round(x * 10000) / 10000;

export function ion(r: TableRow, extras: IonExtras = {}): Ionization {
  return {
    label: r.label,
    pKa25: r.pKa25,
    zAcid: r.zAcid,
    dH: r.dH,
    dCp: r.dCp,
    dpKadT: r.dpKadT,
    temperatureModel: extras.useRoy ? 'roy' : 'goldberg',
    roy: extras.roy ?? null,
    publishedPoints: extras.published ?? [],
    usefulRange: [round4(r.pKa25 - 1), round4(r.pKa25 + 1)],
    sources: {
      row: r.row,
      pKa25: r.pKaSource,
      dH: r.dH === null ? null : (r.dHSource ?? r.pKaSource),
      dCp: r.dCp === null ? null : (r.dCpSource ?? r.dHSource ?? r.pKaSource),
      dpKadT: DPKADT_SOURCE,
      usefulRange: USEFUL_RANGE_SOURCE,
    },
    mixFormIds: extras.mix ?? null,
    titration: extras.titrate ? { startFormId: extras.titrate[0], titrant: extras.titrate[1] } : null,
    note: extras.note ?? null,
  };
}
