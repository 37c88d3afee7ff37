// Amine buffer systems (cationic acid forms, z = +1) of SCIENCE.md §2.5: Tris, Bis-Tris,
// imidazole, ethanolamine.
import { form, ion } from './define';
import type { BufferSystem } from './schema';
import { ROY_REFS } from './sources';

export const tris: BufferSystem = {
  id: 'tris',
  name: 'Tris',
  aliases: ['Tris-HCl', 'THAM', 'trometamol'],
  ionizations: [
    ion(
      {
        label: 'pKa',
        pKa25: 8.072,
        zAcid: 1,
        dH: 47.45,
        dCp: -59,
        dpKadT: -0.0279,
        row: 'G',
        pKaSource: 'G',
      },
      { mix: ['tris-hydrochloride', 'tris'], titrate: ['tris', 'HCl'] },
    ),
  ],
  forms: [
    form('tris', 'Tris base', 'C4H11NO3'),
    form('tris-hydrochloride', 'Tris hydrochloride', 'C4H11NO3·HCl', { Cl: 1 }),
  ],
  designerDefault: true,
  cautions: ['Tris is a primary amine: it reacts with aldehydes and inhibits some enzymes.'],
  notes: [],
};

export const bisTris: BufferSystem = {
  id: 'bis-tris',
  name: 'Bis-Tris',
  aliases: [],
  ionizations: [
    ion(
      {
        label: 'pKa',
        pKa25: 6.484,
        zAcid: 1,
        dH: 28.4,
        dCp: 27,
        dpKadT: -0.0167,
        row: 'G; Roy 2014: 6.4828',
        pKaSource: 'G',
      },
      {
        mix: ['bis-tris-hydrochloride', 'bis-tris'],
        titrate: ['bis-tris', 'HCl'],
        roy: { A: 921.66, B: 14.0007, C: -1.86197, validFromC: 5, validToC: 55, source: ROY_REFS.bisTris },
        published: [
          { celsius: 25, pKa: 6.4828, uncertainty: 0.0005, source: ROY_REFS.bisTris },
          { celsius: 37, pKa: 6.2906, uncertainty: 0.0006, source: ROY_REFS.bisTris },
        ],
      },
    ),
  ],
  forms: [
    form('bis-tris', 'Bis-Tris', 'C8H19NO5'),
    form('bis-tris-hydrochloride', 'Bis-Tris hydrochloride', 'C8H19NO5·HCl', { Cl: 1 }),
  ],
  designerDefault: true,
  cautions: ['Bis-Tris binds some metal ions (Cu²⁺, Pb²⁺).'],
  notes: [],
};

export const imidazole: BufferSystem = {
  id: 'imidazole',
  name: 'Imidazole',
  aliases: [],
  ionizations: [
    ion(
      { label: 'pKa', pKa25: 6.993, zAcid: 1, dH: 36.64, dCp: -9, dpKadT: -0.0215, row: 'G', pKaSource: 'G' },
      { mix: ['imidazole-hydrochloride', 'imidazole'], titrate: ['imidazole', 'HCl'] },
    ),
  ],
  forms: [
    form('imidazole', 'Imidazole', 'C3H4N2'),
    form('imidazole-hydrochloride', 'Imidazole hydrochloride', 'C3H4N2·HCl', { Cl: 1 }),
  ],
  designerDefault: true,
  cautions: ['Imidazole binds metal ions and absorbs near 280 nm at high concentration.'],
  notes: [],
};

export const ethanolamine: BufferSystem = {
  id: 'ethanolamine',
  name: 'Ethanolamine',
  aliases: ['monoethanolamine', 'MEA'],
  ionizations: [
    ion(
      { label: 'pKa', pKa25: 9.498, zAcid: 1, dH: 50.52, dCp: 26, dpKadT: -0.0297, row: 'G', pKaSource: 'G' },
      { mix: ['ethanolamine-hydrochloride', 'ethanolamine'], titrate: ['ethanolamine', 'HCl'] },
    ),
  ],
  forms: [
    form('ethanolamine', 'Ethanolamine', 'C2H7NO', {
      state: 'liquid',
      density: 1.012,
      note: 'Density [memory].',
    }),
    form('ethanolamine-hydrochloride', 'Ethanolamine hydrochloride', 'C2H7NO·HCl', { Cl: 1 }),
  ],
  designerDefault: true,
  cautions: ['Ethanolamine is corrosive: wear gloves and eye protection.'],
  notes: [],
};
