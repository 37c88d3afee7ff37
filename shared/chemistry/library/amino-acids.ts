// Amino-acid and N-substituted glycine buffer systems of SCIENCE.md §2.5: glycine, histidine,
// glycylglycine, Tricine, Bicine.
import { form, ion } from './define';
import type { BufferSystem } from './schema';

export const glycine: BufferSystem = {
  id: 'glycine',
  name: 'Glycine',
  aliases: ['glycine-HCl', 'glycine-NaOH'],
  ionizations: [
    ion(
      { label: 'pK1', pKa25: 2.351, zAcid: 1, dH: 4.0, dCp: -139, dpKadT: -0.0024, row: 'G', pKaSource: 'G' },
      { mix: ['glycine-hydrochloride', 'glycine'], titrate: ['glycine', 'HCl'] },
    ),
    ion(
      { label: 'pK2', pKa25: 9.78, zAcid: 0, dH: 44.2, dCp: -57, dpKadT: -0.026, row: 'G', pKaSource: 'G' },
      { mix: ['glycine', 'sodium-glycinate'], titrate: ['glycine', 'NaOH'] },
    ),
  ],
  forms: [
    form('glycine', 'Glycine', 'C2H5NO2'),
    form('glycine-hydrochloride', 'Glycine hydrochloride', 'C2H5NO2·HCl', { Cl: 1 }),
    form('sodium-glycinate', 'Sodium glycinate', 'C2H4NNaO2', { Na: 1 }),
  ],
  designerDefault: true,
  cautions: [],
  notes: [],
};

export const histidine: BufferSystem = {
  id: 'histidine',
  name: 'L-Histidine',
  aliases: ['His'],
  ionizations: [
    ion(
      {
        label: 'pKa (imidazole)',
        pKa25: 6.07,
        zAcid: 1,
        dH: 29.5,
        dCp: 176,
        dpKadT: -0.0173,
        row: 'G',
        pKaSource: 'G',
      },
      {
        mix: ['l-histidine-hydrochloride-monohydrate', 'l-histidine'],
        titrate: ['l-histidine', 'HCl'],
        note: 'Only the imidazole step is modelled; the carboxyl and amino steps lie far from its range.',
      },
    ),
  ],
  forms: [
    form('l-histidine', 'L-Histidine', 'C6H9N3O2'),
    form(
      'l-histidine-hydrochloride-monohydrate',
      'L-Histidine monohydrochloride monohydrate',
      'C6H9N3O2·HCl·H2O',
      {
        Cl: 1,
      },
    ),
  ],
  designerDefault: true,
  cautions: ['Histidine binds metal ions (Zn²⁺, Ni²⁺, Cu²⁺).'],
  notes: [],
};

export const glycylglycine: BufferSystem = {
  id: 'glycylglycine',
  name: 'Glycylglycine',
  aliases: ['Gly-Gly'],
  ionizations: [
    ion(
      {
        label: 'pK2',
        pKa25: 8.265,
        zAcid: 0,
        dH: 43.4,
        dCp: null,
        dpKadT: -0.0255,
        row: '[memory]',
        pKaSource: '[memory]',
      },
      { titrate: ['glycylglycine', 'NaOH'], note: 'pK and ΔH recalled from memory (SCIENCE.md §2.5).' },
    ),
  ],
  forms: [form('glycylglycine', 'Glycylglycine', 'C4H8N2O3')],
  designerDefault: false,
  cautions: ['Its pKa and ΔH are recalled from memory ([memory]): check them before relying on this buffer.'],
  notes: [],
};

export const tricine: BufferSystem = {
  id: 'tricine',
  name: 'Tricine',
  aliases: [],
  ionizations: [
    ion(
      {
        label: 'pKa',
        pKa25: 8.135,
        zAcid: 0,
        dH: 31.37,
        dCp: -53,
        dpKadT: -0.0184,
        row: 'G',
        pKaSource: 'G',
      },
      { titrate: ['tricine', 'NaOH'] },
    ),
  ],
  forms: [form('tricine', 'Tricine', 'C6H13NO5')],
  designerDefault: true,
  cautions: ['Tricine binds some metal ions.'],
  notes: [],
};

export const bicine: BufferSystem = {
  id: 'bicine',
  name: 'Bicine',
  aliases: [],
  ionizations: [
    ion(
      {
        label: 'pK2',
        pKa25: 8.333,
        zAcid: 0,
        dH: 24.9,
        dCp: null,
        dpKadT: -0.0146,
        row: 'Roy 2006; cal',
        pKaSource: 'Roy 2006',
        dHSource: 'cal',
      },
      {
        titrate: ['bicine', 'NaOH'],
        published: [
          { celsius: 25, pKa: 8.333, uncertainty: null, source: 'Roy 2006 (SCIENCE.md §2.5)' },
          { celsius: 37, pKa: 8.156, uncertainty: null, source: 'Roy 2006 (SCIENCE.md §2.5)' },
        ],
      },
    ),
  ],
  forms: [form('bicine', 'Bicine', 'C6H13NO4')],
  designerDefault: true,
  cautions: ['Bicine binds some metal ions.'],
  notes: [],
};
