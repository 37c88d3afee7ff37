// Carboxylic-acid buffer systems of SCIENCE.md §2.5: formate, acetate, succinate, citrate, maleate.
import { form, ion } from './define';
import type { BufferSystem } from './schema';

export const formate: BufferSystem = {
  id: 'formate',
  name: 'Sodium formate',
  aliases: ['formic acid'],
  ionizations: [
    ion(
      {
        label: 'pKa',
        pKa25: 3.752,
        zAcid: 0,
        dH: -0.34,
        dCp: null,
        dpKadT: 0.0002,
        row: 'STEEP ref "c"',
        pKaSource: 'STEEP ref "c"',
      },
      { mix: ['formic-acid', 'sodium-formate'], titrate: ['formic-acid', 'NaOH'] },
    ),
  ],
  forms: [
    form('formic-acid', 'Formic acid', 'CH2O2', {
      state: 'liquid',
      density: 1.22,
      note: 'Density [memory].',
    }),
    form('sodium-formate', 'Sodium formate', 'CHNaO2', { Na: 1 }),
  ],
  designerDefault: true,
  cautions: ['Formic acid is corrosive and volatile: work in a fume hood.'],
  notes: [],
};

export const acetate: BufferSystem = {
  id: 'acetate',
  name: 'Sodium acetate',
  aliases: ['acetic acid', 'sodium acetate'],
  ionizations: [
    ion(
      {
        label: 'pKa',
        pKa25: 4.756,
        zAcid: 0,
        dH: -0.41,
        dCp: -142,
        dpKadT: 0.0002,
        row: 'G',
        pKaSource: 'G',
      },
      { mix: ['acetic-acid', 'sodium-acetate'], titrate: ['acetic-acid', 'NaOH'] },
    ),
  ],
  forms: [
    form('acetic-acid', 'Acetic acid (glacial)', 'C2H4O2', {
      state: 'liquid',
      density: 1.049,
      note: 'Density [memory].',
    }),
    form('sodium-acetate', 'Sodium acetate', 'C2H3NaO2', { Na: 1 }),
    form('sodium-acetate-trihydrate', 'Sodium acetate trihydrate', 'C2H3NaO2·3H2O', { Na: 1 }),
  ],
  designerDefault: true,
  cautions: [],
  notes: [],
};

export const succinate: BufferSystem = {
  id: 'succinate',
  name: 'Sodium succinate',
  aliases: ['succinic acid'],
  ionizations: [
    ion(
      { label: 'pK1', pKa25: 4.207, zAcid: 0, dH: 3.0, dCp: -121, dpKadT: -0.0018, row: 'G', pKaSource: 'G' },
      { mix: ['succinic-acid', 'disodium-succinate-hexahydrate'], titrate: ['succinic-acid', 'NaOH'] },
    ),
    ion(
      {
        label: 'pK2',
        pKa25: 5.636,
        zAcid: -1,
        dH: -0.5,
        dCp: -217,
        dpKadT: 0.0003,
        row: 'G',
        pKaSource: 'G',
      },
      { mix: ['succinic-acid', 'disodium-succinate-hexahydrate'], titrate: ['succinic-acid', 'NaOH'] },
    ),
  ],
  forms: [
    form('succinic-acid', 'Succinic acid', 'C4H6O4'),
    form('disodium-succinate-hexahydrate', 'Disodium succinate hexahydrate', 'C4H4Na2O4·6H2O', { Na: 2 }),
  ],
  designerDefault: true,
  cautions: [],
  notes: [],
};

const citrateMix: [string, string] = ['citric-acid-monohydrate', 'trisodium-citrate-dihydrate'];
export const citrate: BufferSystem = {
  id: 'citrate',
  name: 'Sodium citrate',
  aliases: ['citric acid', 'sodium citrate'],
  ionizations: [
    ion(
      {
        label: 'pK1',
        pKa25: 3.128,
        zAcid: 0,
        dH: 4.07,
        dCp: -131,
        dpKadT: -0.0024,
        row: 'G',
        pKaSource: 'G',
      },
      { mix: citrateMix, titrate: ['citric-acid-monohydrate', 'NaOH'] },
    ),
    ion(
      {
        label: 'pK2',
        pKa25: 4.761,
        zAcid: -1,
        dH: 2.23,
        dCp: -178,
        dpKadT: -0.0013,
        row: 'G',
        pKaSource: 'G',
      },
      { mix: citrateMix, titrate: ['citric-acid-monohydrate', 'NaOH'] },
    ),
    ion(
      {
        label: 'pK3',
        pKa25: 6.396,
        zAcid: -2,
        dH: -3.38,
        dCp: -254,
        dpKadT: 0.002,
        row: 'G',
        pKaSource: 'G',
      },
      { mix: citrateMix, titrate: ['citric-acid-monohydrate', 'NaOH'] },
    ),
  ],
  forms: [
    form('citric-acid', 'Citric acid (anhydrous)', 'C6H8O7'),
    form('citric-acid-monohydrate', 'Citric acid monohydrate', 'C6H8O7·H2O'),
    form('monosodium-citrate', 'Sodium dihydrogen citrate', 'C6H7NaO7', { Na: 1 }),
    form(
      'disodium-hydrogen-citrate-sesquihydrate',
      'Disodium hydrogen citrate sesquihydrate',
      'C6H6Na2O7·1.5H2O',
      {
        Na: 2,
      },
    ),
    form('trisodium-citrate-dihydrate', 'Trisodium citrate dihydrate', 'C6H5Na3O7·2H2O', { Na: 3 }),
  ],
  designerDefault: true,
  cautions: ['Citrate chelates metal ions (Ca²⁺, Mg²⁺, Zn²⁺, Fe³⁺): avoid it with metal-dependent enzymes.'],
  notes: [],
};

export const maleate: BufferSystem = {
  id: 'maleate',
  name: 'Sodium maleate',
  aliases: ['maleic acid'],
  ionizations: [
    ion(
      { label: 'pK2', pKa25: 6.27, zAcid: -1, dH: -3.6, dCp: -31, dpKadT: 0.0021, row: 'G', pKaSource: 'G' },
      {
        mix: ['maleic-acid', 'disodium-maleate'],
        titrate: ['maleic-acid', 'NaOH'],
        note: 'Only pK2 is in the table; the first step (strong) is treated as complete.',
      },
    ),
  ],
  forms: [
    form('maleic-acid', 'Maleic acid', 'C4H4O4'),
    form('disodium-maleate', 'Disodium maleate', 'C4H2Na2O4', { Na: 2 }),
  ],
  designerDefault: false,
  cautions: [
    'Maleate absorbs in the UV: check the blank at short wavelengths.',
    'The first dissociation step is not modelled: results below about pH 4 are not reliable.',
  ],
  notes: [],
};
