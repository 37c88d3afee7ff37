// Good's zwitterionic sulfonate buffers of SCIENCE.md §2.5 (Good et al. 1966 introduced them;
// the values here are thermodynamic, from the sources each row names).
import { form, ion, type IonExtras, type TableRow } from './define';
import type { BufferSystem, BufferForm } from './schema';
import { ROY_REFS } from './sources';

interface GoodSpec {
  id: string;
  name: string;
  formula: string;
  /** Formula of the sodium salt, when it is a usual commercial form. */
  sodiumFormula?: string;
  row: Omit<TableRow, 'label' | 'zAcid'> & { label?: string; zAcid?: number };
  extras?: IonExtras;
  cautions?: string[];
  extraForms?: BufferForm[];
}

function good(spec: GoodSpec): BufferSystem {
  const acid = form(spec.id, `${spec.name} (free acid)`, spec.formula);
  const salt = spec.sodiumFormula
    ? [form(`${spec.id}-sodium`, `${spec.name} sodium salt`, spec.sodiumFormula, { Na: 1 })]
    : [];
  const mix: [string, string] | undefined = spec.sodiumFormula ? [spec.id, `${spec.id}-sodium`] : undefined;
  return {
    id: spec.id,
    name: spec.name,
    aliases: [],
    ionizations: [
      ion({ label: 'pKa', zAcid: 0, ...spec.row }, { mix, titrate: [spec.id, 'NaOH'], ...spec.extras }),
    ],
    forms: [acid, ...(spec.extraForms ?? []), ...salt],
    designerDefault: true,
    cautions: spec.cautions ?? [],
    notes: [],
  };
}

const royEq = (A: number, B: number, C: number, source: string) => ({
  A,
  B,
  C,
  validFromC: 5,
  validToC: 55,
  source,
});
const roy1997 = { row: 'Roy 1997', pKaSource: 'Roy 1997' };

export const goodsBuffers: BufferSystem[] = [
  good({
    id: 'mes',
    name: 'MES',
    formula: 'C6H13NO4S',
    sodiumFormula: 'C6H12NNaO4S',
    extraForms: [form('mes-monohydrate', 'MES monohydrate', 'C6H13NO4S·H2O')],
    row: { pKa25: 6.27, dH: 14.8, dCp: 5, dpKadT: -0.0087, row: 'G; VB 6.270', pKaSource: 'G' },
  }),
  good({
    id: 'aces',
    name: 'ACES',
    formula: 'C4H10N2O4S',
    row: { label: 'pK2', pKa25: 6.847, dH: 30.43, dCp: -61.6, dpKadT: -0.0179, ...roy1997 },
    extras: { useRoy: true, roy: royEq(2548.6, -20.03159, 3.2172, ROY_REFS.acesChes) },
  }),
  good({
    id: 'mopso',
    name: 'MOPSO',
    formula: 'C7H15NO5S',
    sodiumFormula: 'C7H14NNaO5S',
    row: { label: 'pK2', pKa25: 6.877, dH: 25.88, dCp: 59.0, dpKadT: -0.0152, ...roy1997 },
    extras: { useRoy: true, roy: royEq(432.25, 22.99923, -3.08415, ROY_REFS.heppsMopso) },
  }),
  good({
    id: 'pipes',
    name: 'PIPES',
    formula: 'C8H18N2O6S2',
    row: {
      label: 'pK2',
      zAcid: -1,
      pKa25: 7.141,
      dH: 11.2,
      dCp: 22,
      dpKadT: -0.0066,
      row: 'G (pK)',
      pKaSource: 'G',
      dHSource: '[memory]',
      dCpSource: '[memory]',
    },
    extraForms: [
      form('pipes-monosodium', 'PIPES monosodium salt', 'C8H17N2NaO6S2', { Na: 1 }),
      form('pipes-disodium', 'PIPES disodium salt', 'C8H16N2Na2O6S2', { Na: 2 }),
    ],
    extras: {
      mix: ['pipes-monosodium', 'pipes-disodium'],
      note: 'Only pK2 is in the table; the first step (strong) is treated as complete. ΔH and ΔCp [memory].',
    },
    cautions: [
      'PIPES free acid dissolves only as it is neutralised: add the base before making up to volume.',
    ],
  }),
  good({
    id: 'mops',
    name: 'MOPS',
    formula: 'C7H15NO4S',
    sodiumFormula: 'C7H14NNaO4S',
    row: { pKa25: 7.184, dH: 21.1, dCp: 25, dpKadT: -0.0124, row: 'G', pKaSource: 'G' },
  }),
  good({
    id: 'bes',
    name: 'BES',
    formula: 'C6H15NO5S',
    sodiumFormula: 'C6H14NNaO5S',
    row: {
      pKa25: 7.187,
      dH: 22.2,
      dCp: null,
      dpKadT: -0.013,
      row: 'VB; cal',
      pKaSource: 'VB',
      dHSource: 'cal',
    },
  }),
  good({
    id: 'tes',
    name: 'TES',
    formula: 'C6H15NO6S',
    sodiumFormula: 'C6H14NNaO6S',
    row: {
      pKa25: 7.55,
      dH: 30.0,
      dCp: null,
      dpKadT: -0.0176,
      row: 'VB; cal',
      pKaSource: 'VB',
      dHSource: 'cal',
    },
  }),
  good({
    id: 'hepes',
    name: 'HEPES',
    formula: 'C8H18N2O4S',
    sodiumFormula: 'C8H17N2NaO4S',
    row: { pKa25: 7.564, dH: 20.4, dCp: 47, dpKadT: -0.012, row: 'G; VB 7.565', pKaSource: 'G' },
  }),
  good({
    id: 'tapso',
    name: 'TAPSO',
    formula: 'C7H17NO7S',
    row: { label: 'pK2', pKa25: 7.634, dH: 38.09, dCp: -17.0, dpKadT: -0.0224, ...roy1997 },
    extras: { useRoy: true, roy: royEq(2254.0057, -4.9783, 0.88672, ROY_REFS.tapso) },
  }),
  good({
    id: 'hepps',
    name: 'HEPPS (EPPS)',
    formula: 'C9H20N2O4S',
    row: { label: 'pK2', pKa25: 7.956, dH: 21.18, dCp: 48.0, dpKadT: -0.0124, ...roy1997 },
    extras: { useRoy: true, roy: royEq(359.23, 21.0324, -2.50647, ROY_REFS.heppsMopso) },
  }),
  good({
    id: 'heppso',
    name: 'HEPPSO',
    formula: 'C9H20N2O5S',
    row: {
      label: 'pK2',
      pKa25: 8.042,
      dH: 23.4,
      dCp: null,
      dpKadT: -0.0137,
      row: 'Roy 1998; cal',
      pKaSource: 'Roy 1998',
      dHSource: 'cal',
    },
    extras: {
      published: [
        { celsius: 25, pKa: 8.042, uncertainty: null, source: 'Roy 1998 (SCIENCE.md §2.5)' },
        { celsius: 37, pKa: 7.876, uncertainty: null, source: 'Roy 1998 (SCIENCE.md §2.5)' },
      ],
    },
  }),
  good({
    id: 'taps',
    name: 'TAPS',
    formula: 'C7H17NO6S',
    sodiumFormula: 'C7H16NNaO6S',
    row: { pKa25: 8.44, dH: 40.4, dCp: 15, dpKadT: -0.0237, row: 'G', pKaSource: 'G' },
  }),
  good({
    id: 'ches',
    name: 'CHES',
    formula: 'C8H17NO3S',
    row: { pKa25: 9.394, dH: 39.55, dCp: 9, dpKadT: -0.0232, row: 'G; Roy 1997 agrees', pKaSource: 'G' },
    extras: { roy: royEq(1917.66, 5.794, -0.4971, ROY_REFS.acesChes) },
  }),
  good({
    id: 'capso',
    name: 'CAPSO',
    formula: 'C9H19NO4S',
    sodiumFormula: 'C9H18NNaO4S',
    row: { label: 'pK2', pKa25: 9.825, dH: 46.66, dCp: 21.3, dpKadT: -0.0274, ...roy1997 },
    extras: { useRoy: true, roy: royEq(2106.21, 9.08772, -1.11049, ROY_REFS.capsCapso) },
  }),
  good({
    id: 'caps',
    name: 'CAPS',
    formula: 'C9H19NO3S',
    sodiumFormula: 'C9H18NNaO3S',
    row: { label: 'pK2', pKa25: 10.499, dH: 48.2, dCp: 94.5, dpKadT: -0.0283, ...roy1997 },
    extras: { useRoy: true, roy: royEq(1046.64, 35.10191, -4.9342, ROY_REFS.capsCapso) },
  }),
];
