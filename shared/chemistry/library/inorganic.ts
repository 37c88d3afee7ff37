// Inorganic buffer systems of SCIENCE.md §2.5: phosphate (sodium and potassium forms), carbonate,
// borate, ammonia, cacodylate. Values exactly as the table prints them, with its source keys.
import { form, ion } from './define';
import type { BufferSystem, Ionization } from './schema';

const phosphateRows = (base: 'NaOH' | 'KOH', m: 'sodium' | 'potassium'): Ionization[] => {
  const ids = {
    1: m === 'sodium' ? 'sodium-dihydrogen-phosphate' : 'potassium-dihydrogen-phosphate',
    2: m === 'sodium' ? 'disodium-hydrogen-phosphate' : 'dipotassium-hydrogen-phosphate',
    3: m === 'sodium' ? 'trisodium-phosphate-dodecahydrate' : 'tripotassium-phosphate',
  };
  return [
    ion(
      { label: 'pK1', pKa25: 2.148, zAcid: 0, dH: -8.0, dCp: -141, dpKadT: 0.0047, row: 'G', pKaSource: 'G' },
      { mix: ['phosphoric-acid', ids[1]], titrate: ['phosphoric-acid', base] },
    ),
    ion(
      {
        label: 'pK2',
        pKa25: 7.198,
        zAcid: -1,
        dH: 3.6,
        dCp: -230,
        dpKadT: -0.0021,
        row: 'G',
        pKaSource: 'G',
      },
      { mix: [ids[1], ids[2]], titrate: [ids[1], base] },
    ),
    ion(
      {
        label: 'pK3',
        pKa25: 12.35,
        zAcid: -2,
        dH: 16.0,
        dCp: -242,
        dpKadT: -0.0094,
        row: 'G',
        pKaSource: 'G',
      },
      { mix: [ids[2], ids[3]], titrate: [ids[2], base] },
    ),
  ];
};

const phosphoricAcid = form('phosphoric-acid', 'Phosphoric acid', 'H3PO4', {
  note: 'Usually sold as an ~85 % (w/w) solution: use the assay and density on the label.',
});
const phosphateCautions = [
  'Precipitates with Ca²⁺, Mg²⁺ and other polyvalent metal ions.',
  'Phosphate activates or inhibits some enzymes: check with an overlap point.',
  'pK2 falls strongly with ionic strength: compute I per point and keep it constant with salt.',
];

export const sodiumPhosphate: BufferSystem = {
  id: 'sodium-phosphate',
  name: 'Sodium phosphate',
  aliases: ['phosphate', 'Na phosphate'],
  ionizations: phosphateRows('NaOH', 'sodium'),
  forms: [
    phosphoricAcid,
    form('sodium-dihydrogen-phosphate', 'Sodium dihydrogen phosphate', 'NaH2PO4', { Na: 1 }),
    form(
      'sodium-dihydrogen-phosphate-monohydrate',
      'Sodium dihydrogen phosphate monohydrate',
      'NaH2PO4·H2O',
      { Na: 1 },
    ),
    form('sodium-dihydrogen-phosphate-dihydrate', 'Sodium dihydrogen phosphate dihydrate', 'NaH2PO4·2H2O', {
      Na: 1,
    }),
    form('disodium-hydrogen-phosphate', 'Disodium hydrogen phosphate', 'Na2HPO4', { Na: 2 }),
    form('disodium-hydrogen-phosphate-dihydrate', 'Disodium hydrogen phosphate dihydrate', 'Na2HPO4·2H2O', {
      Na: 2,
    }),
    form(
      'disodium-hydrogen-phosphate-heptahydrate',
      'Disodium hydrogen phosphate heptahydrate',
      'Na2HPO4·7H2O',
      {
        Na: 2,
      },
    ),
    form(
      'disodium-hydrogen-phosphate-dodecahydrate',
      'Disodium hydrogen phosphate dodecahydrate',
      'Na2HPO4·12H2O',
      {
        Na: 2,
      },
    ),
    form('trisodium-phosphate-dodecahydrate', 'Trisodium phosphate dodecahydrate', 'Na3PO4·12H2O', { Na: 3 }),
  ],
  designerDefault: true,
  cautions: phosphateCautions,
  notes: [],
};

export const potassiumPhosphate: BufferSystem = {
  id: 'potassium-phosphate',
  name: 'Potassium phosphate',
  aliases: ['K phosphate'],
  ionizations: phosphateRows('KOH', 'potassium'),
  forms: [
    phosphoricAcid,
    form('potassium-dihydrogen-phosphate', 'Potassium dihydrogen phosphate', 'KH2PO4', { K: 1 }),
    form('dipotassium-hydrogen-phosphate', 'Dipotassium hydrogen phosphate', 'K2HPO4', { K: 2 }),
    form(
      'dipotassium-hydrogen-phosphate-trihydrate',
      'Dipotassium hydrogen phosphate trihydrate',
      'K2HPO4·3H2O',
      {
        K: 2,
      },
    ),
    form('tripotassium-phosphate', 'Tripotassium phosphate', 'K3PO4', { K: 3 }),
  ],
  // The same chemistry as sodium phosphate: the designer offers one of the two unless asked.
  designerDefault: false,
  cautions: phosphateCautions,
  notes: [],
};

export const carbonate: BufferSystem = {
  id: 'carbonate',
  name: 'Sodium carbonate / bicarbonate',
  aliases: ['bicarbonate', 'carbonate-bicarbonate'],
  ionizations: [
    ion(
      {
        label: 'pK1',
        pKa25: 6.351,
        zAcid: 0,
        dH: 9.15,
        dCp: -371,
        dpKadT: -0.0054,
        row: 'G',
        pKaSource: 'G',
      },
      {
        titrate: ['sodium-bicarbonate', 'HCl'],
        note: 'The acid form is dissolved CO2: no weighable acid form.',
      },
    ),
    ion(
      {
        label: 'pK2',
        pKa25: 10.329,
        zAcid: -1,
        dH: 14.7,
        dCp: -249,
        dpKadT: -0.0086,
        row: 'G',
        pKaSource: 'G',
      },
      { mix: ['sodium-bicarbonate', 'sodium-carbonate'], titrate: ['sodium-bicarbonate', 'NaOH'] },
    ),
  ],
  forms: [
    form('sodium-bicarbonate', 'Sodium hydrogen carbonate', 'NaHCO3', { Na: 1 }),
    form('sodium-carbonate', 'Sodium carbonate', 'Na2CO3', { Na: 2 }),
  ],
  designerDefault: false,
  cautions: ['Exchanges CO2 with the air: open solutions drift in pH; keep containers and plates closed.'],
  notes: [],
};

export const borate: BufferSystem = {
  id: 'borate',
  name: 'Borate',
  aliases: ['boric acid', 'borax'],
  ionizations: [
    ion(
      {
        label: 'pKa',
        pKa25: 9.237,
        zAcid: 0,
        dH: 13.8,
        dCp: -240,
        dpKadT: -0.0081,
        row: 'G',
        pKaSource: 'G',
      },
      { mix: ['boric-acid', 'borax'], titrate: ['boric-acid', 'NaOH'] },
    ),
  ],
  forms: [
    form('boric-acid', 'Boric acid', 'H3BO3'),
    form('borax', 'Sodium tetraborate decahydrate (borax)', 'Na2B4O7·10H2O', {
      Na: 2,
      unitsPerFormula: 4,
      note: 'One formula unit gives four borate units: 2 B(OH)3 + 2 B(OH)4⁻.',
    }),
    form('sodium-metaborate-tetrahydrate', 'Sodium metaborate tetrahydrate', 'NaBO2·4H2O', { Na: 1 }),
  ],
  designerDefault: false,
  cautions: [
    'Borate binds diols (sugars, glycerol, some substrates and cofactors).',
    'Polyborate ions form in concentrated solutions: the single-pKa model is approximate there.',
  ],
  notes: [],
};

export const ammonia: BufferSystem = {
  id: 'ammonia',
  name: 'Ammonium chloride / ammonia',
  aliases: ['ammonium', 'ammonium chloride'],
  ionizations: [
    ion(
      { label: 'pKa', pKa25: 9.245, zAcid: 1, dH: 51.95, dCp: 8, dpKadT: -0.0305, row: 'G', pKaSource: 'G' },
      { mix: ['ammonium-chloride', 'ammonia'], titrate: ['ammonium-chloride', 'NaOH'] },
    ),
  ],
  forms: [
    form('ammonium-chloride', 'Ammonium chloride', 'NH4Cl', { Cl: 1 }),
    form('ammonia', 'Ammonia (as a solution of known molarity)', 'NH3', {
      note: 'Sold as concentrated aqueous solution: give its molarity as a stock concentration.',
    }),
  ],
  designerDefault: false,
  cautions: ['Ammonia is volatile: open solutions lose it and their pH falls.'],
  notes: [],
};

export const cacodylate: BufferSystem = {
  id: 'cacodylate',
  name: 'Sodium cacodylate',
  aliases: ['cacodylic acid', 'dimethylarsinate'],
  ionizations: [
    ion(
      { label: 'pKa', pKa25: 6.28, zAcid: 0, dH: -3.0, dCp: -86, dpKadT: 0.0018, row: 'G', pKaSource: 'G' },
      {
        mix: ['cacodylic-acid', 'sodium-cacodylate-trihydrate'],
        titrate: ['sodium-cacodylate-trihydrate', 'HCl'],
      },
    ),
  ],
  forms: [
    form('cacodylic-acid', 'Cacodylic acid', 'C2H7AsO2'),
    form('sodium-cacodylate-trihydrate', 'Sodium cacodylate trihydrate', 'C2H6AsNaO2·3H2O', { Na: 1 }),
  ],
  designerDefault: false,
  cautions: ['Contains arsenic: toxic; handle with gloves and dispose of as hazardous waste.'],
  notes: [],
};
