import { describe, expect, it } from 'vitest';
import type { ResolverOptions } from 'react-hook-form';
import { designerResolver } from '@/features/buffer-series/utils/designer-resolver';
import {
  checkDesigner,
  defaultDesignerValues,
  designerFieldOf,
  fromRequest,
  parsePHList,
  pHPointsOf,
  toRequest,
  type DesignerValues,
} from '@/features/buffer-series/utils/designer-values';
import { stableJson } from '@/features/buffer-series/utils/stable-json';

const values = (over: Partial<DesignerValues> = {}): DesignerValues => ({
  ...defaultDesignerValues(),
  ...over,
});

describe('the pH list as typed', () => {
  it('when pH values are separated by commas, semicolons or spaces, then each is read', () => {
    expect(parsePHList('3, 3.5; 4 4.5\n5')).toEqual({ ok: true, value: [3, 3.5, 4, 4.5, 5] });
    expect(parsePHList('  ')).toEqual({ ok: true, value: [] });
  });

  it('when a word is not a number, then the first such word is named', () => {
    expect(parsePHList('4, 5, six, seven')).toEqual({ ok: false, message: '“six” is not a pH value.' });
    expect(parsePHList('4, Infinity').ok).toBe(false);
  });

  it('when a typographic minus is typed, then it reads as a minus (the schema then refuses the pH)', () => {
    expect(parsePHList('−1')).toEqual({ ok: true, value: [-1] });
  });
});

describe('the pH points of the form', () => {
  it('when a list is given, then repeated values go and the points are sorted', () => {
    expect(pHPointsOf(values({ pHMode: 'list', pHList: '7, 5, 6, 5' }))).toEqual([5, 6, 7]);
    expect(pHPointsOf(values({ pHMode: 'list', pHList: '5, x' }))).toEqual([]);
  });

  it('when a range is given, then it runs from start to stop inclusive in steps', () => {
    expect(pHPointsOf(values())).toEqual([3, 3.5, 4, 4.5, 5, 5.5, 6, 6.5, 7, 7.5, 8]);
    expect(pHPointsOf(values({ pHStart: 4, pHStop: 5, pHStep: 0.3 }))).toEqual([4, 4.3, 4.6, 4.9]);
    expect(pHPointsOf(values({ pHStart: 6, pHStop: 5 }))).toEqual([]);
  });
});

describe('the request the designer sends', () => {
  it('when the defaults are sent, then they pass the shared schema', () => {
    const checked = checkDesigner(values());
    expect(checked.ok).toBe(true);
    if (checked.ok) {
      expect(checked.request.pHPoints).toHaveLength(11);
      expect(checked.request.systems).toBeNull();
      expect(checked.request.well?.additions).toHaveLength(2);
    }
  });

  it('when overrides name points that are no longer in the series, then they are dropped', () => {
    const r = toRequest(values(), { '4.50': 'acetate', '9.00': 'borate', '6.00': 'mes' });
    expect(r.overrides).toEqual({ '4.50': 'acetate', '6.00': 'mes' });
  });

  it('when systems are left to the designer, the well is off and an ionic strength is cleared, then they are sent as null', () => {
    const r = toRequest(
      values({
        systemsMode: 'default',
        systems: ['mes'],
        wellEnabled: false,
        targetIonicStrengthM: Number.NaN,
      }),
    );
    expect(r.systems).toBeNull();
    expect(r.well).toBeNull();
    expect(r.targetIonicStrengthM).toBeNull();
    expect(toRequest(values({ systemsMode: 'chosen', systems: ['mes', 'hepes'] })).systems).toEqual([
      'mes',
      'hepes',
    ]);
  });

  it('when an addition is not in a buffer, then it is sent as water', () => {
    const v = values();
    v.additions = [
      { ...v.additions[0], inBuffer: false },
      { ...v.additions[1], inBuffer: true, systemId: 'hepes', pH: 7 },
    ];
    const well = toRequest(v).well;
    expect(well?.additions[0].buffer).toBeNull();
    expect(well?.additions[1].buffer).toEqual({ systemId: 'hepes', concMm: 20, pH: 7 });
  });

  it('when a saved request is opened and sent again, then the same request goes out', () => {
    const first = checkDesigner(
      values({
        systemsMode: 'chosen',
        systems: ['acetate', 'mes'],
        targetIonicStrengthM: 0.1,
        salt: 'KCl',
        overlap: false,
      }),
    );
    if (!first.ok) throw new Error(JSON.stringify(first.errors));
    const again = checkDesigner(fromRequest(first.request));
    if (!again.ok) throw new Error(JSON.stringify(again.errors));
    expect(stableJson(again.request)).toBe(stableJson(first.request));
  });

  it('when a saved request had no well, then the form opens with the well off and default additions', () => {
    const checked = checkDesigner(values({ wellEnabled: false }));
    if (!checked.ok) throw new Error('defaults refused');
    const v = fromRequest(checked.request);
    expect(v.wellEnabled).toBe(false);
    expect(v.additions).toEqual(defaultDesignerValues().additions);
    expect(v.pHMode).toBe('list');
  });
});

describe('designer messages on the fields typed into', () => {
  it('when the range runs backwards or the step is not above zero, then the range fields say so', () => {
    expect(checkDesigner(values({ pHStart: 8, pHStop: 3 }))).toEqual({
      ok: false,
      errors: expect.objectContaining({ pHStop: 'Stop must not be below start.' }),
    });
    const step = checkDesigner(values({ pHStep: 0 }));
    expect(step.ok === false && step.errors.pHStep).toBe('The step must be above zero.');
  });

  it('when the list has a word that is not a number or no point at all, then the list field says so', () => {
    const word = checkDesigner(values({ pHMode: 'list', pHList: '5, five' }));
    expect(word.ok === false && word.errors.pHList).toBe('“five” is not a pH value.');
    const empty = checkDesigner(values({ pHMode: 'list', pHList: '' }));
    expect(empty.ok === false && empty.errors.pHList).toBe('Give at least one pH point.');
  });

  it('when a pH point is off the scale, then the message goes to the field that set it', () => {
    const list = checkDesigner(values({ pHMode: 'list', pHList: '5, 15' }));
    expect(list.ok === false && Object.keys(list.errors)).toEqual(['pHList']);
    const start = checkDesigner(values({ pHStart: -1, pHStop: 3 }));
    expect(start.ok === false && Object.keys(start.errors)).toEqual(['pHStart']);
    const stop = checkDesigner(values({ pHStart: 12, pHStop: 15 }));
    expect(stop.ok === false && Object.keys(stop.errors)).toEqual(['pHStop']);
  });

  it('when a number of the form is out of range, then its own field carries the shared message', () => {
    const conc = checkDesigner(values({ bufferConcMm: 0 }));
    expect(conc.ok === false && conc.errors.bufferConcMm).toBe('Concentration must be above zero.');
    const v = values();
    v.additions = [{ ...v.additions[0], volumeUl: 0 }, v.additions[1]];
    const addition = checkDesigner(v);
    expect(addition.ok === false && addition.errors['additions.0.volumeUl']).toBe(
      'Volume must be above zero.',
    );
  });

  it('when a request path is placed, then it maps to the form field a scientist sees', () => {
    const v = values();
    expect(designerFieldOf(['well', 'bufferVolumeUl'], v)).toBe('bufferVolumeUl');
    expect(designerFieldOf(['well', 'additions', 1, 'buffer', 'concMm'], v)).toBe('additions.1.concMm');
    expect(designerFieldOf(['well', 'additions', 0, 'buffer'], v)).toBe('additions.0.label');
    expect(designerFieldOf(['well'], v)).toBe('bufferVolumeUl');
    expect(designerFieldOf(['systems', 2], v)).toBe('systems');
    expect(designerFieldOf(['overrides', '4.50'], v)).toBe('root');
    expect(designerFieldOf(['assayTemperatureC'], v)).toBe('assayTemperatureC');
    expect(designerFieldOf([], v)).toBe('root');
  });
});

describe('the designer form resolver', () => {
  const options = { fields: {}, shouldUseNativeValidation: false } as ResolverOptions<DesignerValues>;

  it('when the form is valid, then the resolver gives the request and no errors', async () => {
    const r = await designerResolver(values(), undefined, options);
    expect(r.errors).toEqual({});
    expect(r.values).toMatchObject({
      pHPoints: [3, 3.5, 4, 4.5, 5, 5.5, 6, 6.5, 7, 7.5, 8],
      bufferConcMm: 50,
    });
  });

  it('when the form is invalid, then the errors are nested as react-hook-form reads them', async () => {
    const v = values({ bufferConcMm: 0 });
    v.additions = [v.additions[0], { ...v.additions[1], volumeUl: -5 }];
    const r = await designerResolver(v, undefined, options);
    expect(r.values).toEqual({});
    expect(r.errors).toMatchObject({
      bufferConcMm: { type: 'schema', message: 'Concentration must be above zero.' },
      additions: [undefined, { volumeUl: { type: 'schema', message: 'Volume must be above zero.' } }],
    });
  });
});

describe('stable JSON of a request', () => {
  it('when two objects differ only in key order, then their text is the same; values still count', () => {
    expect(stableJson({ b: 1, a: { d: [2, 1], c: null } })).toBe(
      stableJson({ a: { c: null, d: [2, 1] }, b: 1 }),
    );
    expect(stableJson({ a: { d: [2, 1] } })).not.toBe(stableJson({ a: { d: [1, 2] } }));
    expect(stableJson({ a: 1 })).not.toBe(stableJson({ a: '1' }));
  });

  it('when an object has undefined fields, then they are left out as JSON does', () => {
    expect(stableJson({ a: 1, b: undefined })).toBe('{"a":1}');
    expect(stableJson([3, { z: 1, y: 2 }])).toBe('[3,{"y":2,"z":1}]');
  });
});
