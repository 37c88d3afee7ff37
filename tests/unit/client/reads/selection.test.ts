import { describe, expect, it } from 'vitest';
import { importSelectionSchema } from '@shared/schemas/plates';
import type { BlockPreview } from '@shared/schemas/plates-types';
import {
  buildSelection,
  initialChoice,
  initialSeries,
  seriesTimes,
  type BlockChoice,
} from '@/features/reads/utils/selection';

const block = (index: number, over: Partial<BlockPreview> = {}): BlockPreview => ({
  index,
  kind: 'endpoint',
  plateFormat: 96,
  sheet: 'Sheet1',
  label: `Read ${index + 1}`,
  location: `A${index * 12 + 1}`,
  layout: 'grid',
  wavelengthNm: 405,
  excitationNm: null,
  wellsWithValues: 96,
  missing: 0,
  flags: {},
  timesS: null,
  preview: {},
  formatMatchesPlate: true,
  ...over,
});
const choose = (b: BlockPreview, over: Partial<BlockChoice> = {}): BlockChoice => ({
  ...initialChoice(b),
  ...over,
});

describe('import choices: defaults', () => {
  it('when a block fits the plate, then it is included with its own label and wavelength; otherwise it is not', () => {
    expect(initialChoice(block(0))).toEqual({
      include: true,
      asSeries: false,
      label: 'Read 1',
      wavelength: '405',
    });
    expect(initialChoice(block(1, { formatMatchesPlate: false, wavelengthNm: null }))).toEqual({
      include: false,
      asSeries: false,
      label: 'Read 2',
      wavelength: '',
    });
  });
});

describe('import choices: time course of grids', () => {
  it('when times are given in minutes, then they are written in seconds from the start', () => {
    expect(seriesTimes({ ...initialSeries, start: '0,5', interval: '2', unit: 'min' }, 3)).toEqual([
      30, 150, 270,
    ]);
    expect(seriesTimes(initialSeries, 4)).toEqual([0, 60, 120, 180]);
  });

  it('when the start is negative, the interval not above zero or either not a number, then there are no times', () => {
    for (const [start, interval] of [
      ['-1', '60'],
      ['0', '0'],
      ['0', '-5'],
      ['x', '60'],
      ['0', ''],
    ]) {
      expect(seriesTimes({ ...initialSeries, start, interval }, 3)).toBeNull();
    }
  });
});

describe('import choices: the selection sent', () => {
  it('when single blocks are chosen, then each becomes its own read and the shared schema accepts it', () => {
    const blocks = [block(0), block(1, { kind: 'kinetic', timesS: [0, 30] }), block(2)];
    const choices = [
      choose(blocks[0], { label: '  pH 5 plate  ' }),
      choose(blocks[1], { wavelength: '' }),
      choose(blocks[2], { include: false }),
    ];
    const r = buildSelection(blocks, choices, initialSeries);
    expect(r).toEqual({
      ok: true,
      reads: 2,
      selection: [
        { type: 'endpoint', blockIndex: 0, wavelengthNm: 405, label: 'pH 5 plate' },
        { type: 'kinetic', blockIndex: 1, wavelengthNm: null, label: 'Read 2' },
      ],
    });
    if (r.ok) expect(importSelectionSchema.safeParse(r.selection).success).toBe(true);
  });

  it('when grids are marked as a time course, then they become one kinetic read, in block order, with their times', () => {
    const blocks = [block(0), block(1), block(2), block(3)];
    const choices = blocks.map((b, i) => choose(b, { asSeries: i !== 1 }));
    const r = buildSelection(blocks, choices, {
      ...initialSeries,
      interval: '30',
      label: 'Time course',
      wavelength: '410',
    });
    expect(r.ok && r.selection).toEqual([
      { type: 'endpoint', blockIndex: 1, wavelengthNm: 405, label: 'Read 2' },
      {
        type: 'grids-as-kinetic',
        blockIndices: [0, 2, 3],
        timesS: [0, 30, 60],
        wavelengthNm: 410,
        label: 'Time course',
      },
    ]);
    if (r.ok) expect(importSelectionSchema.safeParse(r.selection).success).toBe(true);
  });

  it('when only one grid is marked as a time course, then the scientist is asked for another', () => {
    const blocks = [block(0), block(1)];
    const r = buildSelection(
      blocks,
      [choose(blocks[0], { asSeries: true }), choose(blocks[1])],
      initialSeries,
    );
    expect(r).toEqual({ ok: false, message: expect.stringContaining('at least two grids') });
  });

  it('when a kinetic block is marked as part of a time course, then it stays a read of its own', () => {
    const blocks = [block(0, { kind: 'kinetic' })];
    const r = buildSelection(blocks, [choose(blocks[0], { asSeries: true })], initialSeries);
    expect(r.ok && r.selection).toEqual([
      { type: 'kinetic', blockIndex: 0, wavelengthNm: 405, label: 'Read 1' },
    ]);
  });

  it('when a wavelength is not a whole number of nm from 200 to 1000, then the block is named in the message', () => {
    for (const wavelength of ['150', '405.5', 'abc', '1200']) {
      const blocks = [block(0)];
      const r = buildSelection(blocks, [choose(blocks[0], { wavelength })], initialSeries);
      expect(r).toEqual({
        ok: false,
        message: 'Block 1 (Read 1): the wavelength is a whole number of nm from 200 to 1000.',
      });
    }
  });

  it('when an included block is of the other plate format, then it is refused', () => {
    const blocks = [block(0, { plateFormat: 384, formatMatchesPlate: false })];
    const r = buildSelection(blocks, [choose(blocks[0], { include: true })], initialSeries);
    expect(r).toEqual({
      ok: false,
      message: 'Block 1 (Read 1) is a 384-well plate; it does not fit this plate.',
    });
  });

  it('when nothing is included, or a time course has no valid times, then nothing is imported and the message says why', () => {
    const blocks = [block(0), block(1)];
    expect(
      buildSelection(
        blocks,
        blocks.map((b) => choose(b, { include: false })),
        initialSeries,
      ),
    ).toEqual({
      ok: false,
      message: 'Pick at least one block to import.',
    });
    const r = buildSelection(
      blocks,
      blocks.map((b) => choose(b, { asSeries: true })),
      { ...initialSeries, interval: '0' },
    );
    expect(r).toEqual({
      ok: false,
      message: 'Give the time course a start of 0 or more and an interval above 0.',
    });
  });

  it('when a label is longer than 200 characters, then it is cut to fit the schema', () => {
    const blocks = [block(0)];
    const r = buildSelection(blocks, [choose(blocks[0], { label: 'x'.repeat(250) })], initialSeries);
    expect(r.ok && r.selection[0].label).toHaveLength(200);
  });
});
