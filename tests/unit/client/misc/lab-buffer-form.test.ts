import { describe, expect, it } from 'vitest';
import type { ResolverOptions } from 'react-hook-form';
import { bufferSystemSchema, findBufferSystem, type BufferSystem } from '@shared/chemistry';
import {
  emptyForm,
  emptyIonization,
  emptyLabBuffer,
  fromSystem,
  labBufferResolver,
  labBufferSchema,
  slugOf,
  toSystem,
  type LabBufferValues,
} from '@/features/buffers/utils/lab-buffer-form';

// An invented lab buffer, shaped like MES (one ionization, free acid and sodium salt); the numbers
// are UI input only.
function labMes(): LabBufferValues {
  const v = emptyLabBuffer();
  v.id = 'lab-mes';
  v.name = ' Lab MES ';
  v.aliasesText = 'MES (lab), , 2-morpholinoethanesulfonic acid';
  v.cautionsText = 'Keep dry.\n\n  Light sensitive.  ';
  v.ionizations = [
    {
      ...emptyIonization(),
      pKa25: 6.27,
      dH: 14.8,
      sources: { row: '', pKa25: 'Lab notebook 12', dH: 'Lab notebook 13', dCp: 'ignored', dpKadT: '' },
      mixAcid: 'lab-mes-acid',
      mixBase: 'lab-mes-na',
      titrationStart: 'lab-mes-acid',
    },
  ];
  v.forms = [
    { ...emptyForm(), id: 'lab-mes-acid', name: 'Free acid', formula: 'C6H13NO4S', formulaWeight: 195.233 },
    {
      ...emptyForm(),
      id: 'lab-mes-na',
      name: 'Sodium salt',
      formula: 'C6H12NNaO4S',
      formulaWeight: 217.215,
      counterIons: { Na: 1, K: 0, Cl: 0 },
    },
  ];
  return v;
}

const options = { fields: {}, shouldUseNativeValidation: false } as ResolverOptions<LabBufferValues>;

describe('lab buffer form: the JSON sent', () => {
  it('when a buffer is filled in, then the JSON passes the shared buffer schema', () => {
    expect(labBufferSchema.safeParse(labMes()).success).toBe(true);
  });

  it('when lists are typed, then aliases split at commas and cautions at lines, blanks dropped, text trimmed', () => {
    const s = toSystem(labMes());
    expect(s.name).toBe('Lab MES');
    expect(s.aliases).toEqual(['MES (lab)', '2-morpholinoethanesulfonic acid']);
    expect(s.cautions).toEqual(['Keep dry.', 'Light sensitive.']);
    expect(s.notes).toEqual([]);
  });

  it('when no useful range is given, then it is pKa ± 1, said to be common practice', () => {
    const ion = toSystem(labMes()).ionizations[0];
    expect(ion.usefulRange).toEqual([5.27, 7.27]);
    expect(ion.sources.usefulRange).toBe('pKa ± 1 (common practice, no source)');
  });

  it('when a useful range is given, then it is kept and credited to the pKa source', () => {
    const v = labMes();
    v.ionizations[0] = { ...v.ionizations[0], usefulLow: 5.5, usefulHigh: 6.7 };
    const ion = toSystem(v).ionizations[0];
    expect(ion.usefulRange).toEqual([5.5, 6.7]);
    expect(ion.sources.usefulRange).toBe('Lab notebook 12');
  });

  it('when a quantity is left empty, then its source is dropped too; the row source falls back to the pKa source', () => {
    const ion = toSystem(labMes()).ionizations[0];
    expect(ion.sources).toMatchObject({
      row: 'Lab notebook 12',
      dH: 'Lab notebook 13',
      dCp: null,
      dpKadT: null,
    });
  });

  it('when the recipe forms are half chosen, then no mixing pair is sent; a titration needs its start form', () => {
    const v = labMes();
    v.ionizations[0] = { ...v.ionizations[0], mixBase: '', titrationStart: '' };
    const ion = toSystem(v).ionizations[0];
    expect(ion.mixFormIds).toBeNull();
    expect(ion.titration).toBeNull();
    expect(toSystem(labMes()).ionizations[0].titration).toEqual({
      startFormId: 'lab-mes-acid',
      titrant: 'NaOH',
    });
  });

  it('when the temperature model is not Roy, then no Roy equation is sent', () => {
    expect(toSystem(labMes()).ionizations[0].roy).toBeNull();
  });
});

describe('lab buffer form: editing a saved system', () => {
  it('when a library system is opened and saved unchanged, then the same system is sent', () => {
    const mes = findBufferSystem('mes') as BufferSystem;
    const again = bufferSystemSchema.parse(toSystem(fromSystem(mes)));
    expect(again).toEqual(mes);
  });

  it('when a lab system with the default useful range is saved unchanged, then the range keeps its own source', () => {
    const saved = bufferSystemSchema.parse(toSystem(labMes()));
    const again = bufferSystemSchema.parse(toSystem(fromSystem(saved)));
    expect(again.ionizations[0].sources.usefulRange).toBe('pKa ± 1 (common practice, no source)');
    expect(again).toEqual(saved);
  });
});

describe('lab buffer form: messages on their fields', () => {
  it('when the form is valid, then the resolver gives the JSON and no errors', async () => {
    const r = await labBufferResolver(labMes(), undefined, options);
    expect(r.errors).toEqual({});
    expect(r.values).toMatchObject({ id: 'lab-mes', name: 'Lab MES' });
  });

  it('when fields are wrong, then each message lands on the field a person typed into', async () => {
    const v = labMes();
    v.id = 'Lab MES';
    v.ionizations[0] = { ...v.ionizations[0], usefulLow: 7, usefulHigh: 6, mixBase: 'no-such-form' };
    v.forms[1] = { ...v.forms[1], formulaWeight: Number.NaN };
    const r = await labBufferResolver(v, undefined, options);
    expect(r.values).toEqual({});
    expect(r.errors).toMatchObject({
      id: { message: 'use lower-case words joined by hyphens, e.g. "sodium-phosphate"' },
      forms: [undefined, { formulaWeight: { type: expect.any(String) } }],
    });
  });

  it('when a cross-field check fails, then its message goes to the field that caused it', async () => {
    const v = labMes();
    v.ionizations[0] = { ...v.ionizations[0], usefulLow: 7, usefulHigh: 6, mixBase: 'no-such-form' };
    const r = await labBufferResolver(v, undefined, options);
    expect(r.errors).toMatchObject({
      ionizations: [
        {
          usefulLow: { message: 'useful range must run low to high' },
          mixAcid: { message: 'unknown form id "no-such-form"' },
        },
      ],
    });
  });

  it('when a required number is left empty, then the pKa field says so', async () => {
    const v = labMes();
    v.ionizations[0] = { ...v.ionizations[0], pKa25: Number.NaN };
    const r = await labBufferResolver(v, undefined, options);
    expect(r.errors).toMatchObject({ ionizations: [{ pKa25: { type: expect.any(String) } }] });
  });
});

describe('ids from names', () => {
  it('when a name is turned into an id, then it is lower-case words joined by hyphens', () => {
    expect(slugOf('Sodium glycinate')).toBe('sodium-glycinate');
    expect(slugOf('  Tris·HCl (pH 8) ')).toBe('tris-hcl-ph-8');
    expect(slugOf('Glycérol–NaOH')).toBe('glycerol-naoh');
    expect(slugOf('x'.repeat(80))).toHaveLength(60);
    expect(slugOf('!!!')).toBe('');
  });
});
