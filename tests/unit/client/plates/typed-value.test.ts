import { describe, expect, it } from 'vitest';
import type { PhPoint, StudyVariant } from '@/features/plates/api/get-study-context';
import { describeTyped, readTyped, typedStarts } from '@/features/plates/utils/typed-value';
import { variantTag, variantTags } from '@/features/plates/utils/variant-tags';

const variants: StudyVariant[] = [
  { id: '00000000-0000-4000-8000-000000000001', name: 'FR1-WT', mutations: '', isParent: true },
  { id: '00000000-0000-4000-8000-000000000002', name: 'FR1-D92N', mutations: 'D92N', isParent: false },
];
const points: PhPoint[] = [
  { pH: 4.5, buffer: 'acetate', bufferName: 'Acetate' },
  { pH: 6, buffer: 'mes', bufferName: 'MES' },
];
const read = (text: string) => readTyped(text, variants, points);

describe('values typed into the grid', () => {
  it('when a pH of the buffer series is typed, then the well takes it with its buffer', () => {
    expect(read('4.5')).toEqual({ ok: true, patch: { pH: 4.5, buffer: 'acetate' }, said: 'pH 4.5' });
    expect(read('4,50')).toMatchObject({ ok: true, patch: { pH: 4.5, buffer: 'acetate' } });
    expect(read('6')).toMatchObject({ ok: true, patch: { pH: 6, buffer: 'mes' } });
  });

  it('when a pH off the series is typed, then only the pH is set', () => {
    expect(read('4.51')).toEqual({ ok: true, patch: { pH: 4.51 }, said: 'pH 4.51' });
    expect(read('.5')).toMatchObject({ ok: true, patch: { pH: 0.5 } });
  });

  it('when a pH outside 0–14 or not a number is typed, then it is refused with a reason', () => {
    expect(read('15')).toEqual({ ok: false, message: 'pH must be between 0 and 14.' });
    for (const text of ['.', ',', '4..5', '4,5,0']) expect(read(text)).toMatchObject({ ok: false });
  });

  it('when r and a whole number 1–99 is typed, then the replicate is set; anything else is refused', () => {
    expect(read('r2')).toEqual({ ok: true, patch: { replicate: 2 }, said: 'replicate 2' });
    expect(read('r99')).toMatchObject({ ok: true, patch: { replicate: 99 } });
    for (const text of ['r0', 'r100', 'r1.5', 'r']) expect(read(text).ok).toBe(false);
  });

  it('when v and a variant number is typed, then the well becomes a sample of that variant', () => {
    expect(read('v2')).toEqual({
      ok: true,
      patch: { role: 'sample', variantId: variants[1].id },
      said: 'FR1-D92N',
    });
    for (const text of ['v0', 'v3', 'v1.5']) {
      expect(read(text)).toEqual({ ok: false, message: 'The study has variants 1 to 2.' });
    }
    expect(readTyped('v2', variants.slice(0, 1), points)).toEqual({ ok: false, message: 'The study has one variant: type v1.' });
    expect(readTyped('v1', [], points)).toEqual({
      ok: false,
      message: 'The study has no variants yet; add them on the study page.',
    });
  });

  it('when c and a concentration is typed, then the well becomes a standard at that concentration', () => {
    expect(read('c50')).toEqual({
      ok: true,
      patch: { role: 'standard', concentrationUm: 50 },
      said: 'standard 50 µM',
    });
    expect(read('c0')).toMatchObject({ ok: true, patch: { concentrationUm: 0 } });
    expect(read('c20000000').ok).toBe(false);
  });

  it('when typing starts, then only digits, a decimal mark and r, v, c begin a value', () => {
    for (const key of ['0', '9', '.', ',', 'r', 'v', 'c']) expect(typedStarts.test(key)).toBe(true);
    for (const key of ['s', 'b', 'R', '-', 'Enter', '12']) expect(typedStarts.test(key)).toBe(false);
  });

  it('when a typed value is shown while typing, then it is said in words', () => {
    expect(describeTyped('r3')).toBe('replicate 3');
    expect(describeTyped('v1')).toBe('variant number 1');
    expect(describeTyped('c5')).toBe('standard 5 µM');
    expect(describeTyped('7.2')).toBe('pH 7.2');
  });
});

describe('variant tags in wells', () => {
  it('when a variant is the parent, then its tag is WT', () => {
    expect(variantTag(variants[0])).toBe('WT');
  });

  it('when a variant has mutations, then its tag is the first, with a count of the others', () => {
    expect(variantTag(variants[1])).toBe('D92N');
    expect(variantTag({ ...variants[1], mutations: 'D92N / E228Q/ K301E' })).toBe('D92N+2');
  });

  it('when a variant has no mutations, then its tag is the end of its name, at most six characters', () => {
    expect(variantTag({ id: 'x', name: 'FR1-library clone 17', mutations: ' ', isParent: false })).toBe(
      '17',
    );
    expect(variantTag({ id: 'x', name: 'consensus', mutations: '', isParent: false })).toBe('consen');
  });

  it('when tags are for a 384-well plate and one is longer than four characters, then all show numbers', () => {
    const three = [...variants, { id: 'c', name: 'FR1-E228Q/K301E', mutations: 'E228Q/K301E', isParent: false }];
    expect(variantTags(three, false)).toEqual({
      [variants[0].id]: 'WT',
      [variants[1].id]: 'D92N',
      c: 'E228Q+1',
    });
    expect(variantTags(three, true)).toEqual({ [variants[0].id]: '1', [variants[1].id]: '2', c: '3' });
    expect(variantTags(variants, true)).toEqual({ [variants[0].id]: 'WT', [variants[1].id]: 'D92N' });
  });

  it('when two short tags would read alike on a 384-well plate, then numbers are shown instead', () => {
    const twins: StudyVariant[] = [
      { id: 'a', name: 'A D92N', mutations: 'D92N', isParent: false },
      { id: 'b', name: 'B D92N', mutations: 'D92N', isParent: false },
    ];
    expect(variantTags(twins, true)).toEqual({ a: '1', b: '2' });
  });
});
