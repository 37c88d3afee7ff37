import { describe, expect, it } from 'vitest';
import { emptyPlateMap, type PlateMap } from '@shared/plate-map/schema';
import {
  clipText,
  copyWells,
  copyWholeMap,
  parseClip,
  pasteClip,
  rememberClip,
  rememberedClip,
  type Clip,
} from '@/features/plates/utils/clipboard';
import { allNames } from '@/features/plates/utils/grid';
import { well, WT } from './wells';

// B2 sample, B3 empty, C2 blank, C3 standard.
const source: PlateMap = {
  wells: {
    B2: well({ variantId: WT, pH: 5, buffer: 'mes', replicate: 1 }),
    C2: well({ role: 'blank', pH: 5, buffer: 'mes' }),
    C3: well({ role: 'standard', concentrationUm: 25 }),
    H12: well({ role: 'unused' }),
  },
  replicatesRequired: 4,
};
const block = ['B2', 'B3', 'C2', 'C3'];

const mustCopy = (map: PlateMap, names: string[], format: 96 | 384 = 96): Clip => {
  const clip = copyWells(map, names, format);
  if (!clip) throw new Error('nothing copied');
  return clip;
};

describe('copying wells', () => {
  it('when a block is copied, then its wells are held relative to its top-left corner, empty ones too', () => {
    const clip = mustCopy(source, block);
    expect(clip).toEqual({
      kind: 'bellwether-wells',
      cells: [
        { dr: 0, dc: 0, well: source.wells.B2 },
        { dr: 0, dc: 1, well: null },
        { dr: 1, dc: 0, well: source.wells.C2 },
        { dr: 1, dc: 1, well: source.wells.C3 },
      ],
    });
  });

  it('when nothing that is a well is selected, then there is nothing to copy', () => {
    expect(copyWells(source, [], 96)).toBeNull();
    expect(copyWells(source, ['P24', 'Z9'], 96)).toBeNull();
  });

  it('when a selection holds names off the plate, then only the wells of the format are copied', () => {
    const clip = mustCopy(source, ['B2', 'P24'], 96);
    expect(clip.kind === 'bellwether-wells' && clip.cells).toEqual([{ dr: 0, dc: 0, well: source.wells.B2 }]);
  });
});

describe('clip text', () => {
  it('when a clip goes through text and back, then it is the same clip', () => {
    for (const clip of [mustCopy(source, block), copyWholeMap(source, 96)]) {
      expect(parseClip(clipText(clip))).toEqual(clip);
    }
  });

  it('when the text is not a Bellwether clip, then it reads as nothing', () => {
    for (const text of [
      '',
      'A1\t0.123',
      'null',
      '[]',
      '{"kind":"something-else","cells":[]}',
      '{"kind":"bellwether-wells"}',
      '{"kind":"bellwether-wells","cells":[{"dr":0,"dc":0,"well":{"role":"enzyme"}}]}',
      '{"kind":"bellwether-wells","cells":[{"dr":0.5,"dc":0,"well":null}]}',
      '{"kind":"bellwether-wells","cells":[{"dr":0,"dc":0,"well":{"role":"sample","pH":15}}]}',
      '{"kind":"bellwether-map","format":48,"map":{"wells":{}}}',
    ]) {
      expect(parseClip(text)).toBeNull();
    }
  });

  it('when a clip holds more cells than a 384-well plate, then it is refused', () => {
    const cells = Array.from({ length: 385 }, (_, i) => ({ dr: 0, dc: i, well: null }));
    expect(parseClip(JSON.stringify({ kind: 'bellwether-wells', cells }))).toBeNull();
    expect(
      parseClip(JSON.stringify({ kind: 'bellwether-wells', cells: cells.slice(0, 384) })),
    ).not.toBeNull();
  });

  it('when a pasted well leaves out optional fields, then they read as empty', () => {
    const clip = parseClip(
      '{"kind":"bellwether-wells","cells":[{"dr":0,"dc":0,"well":{"role":"blank","pH":6}}]}',
    );
    expect(clip?.kind === 'bellwether-wells' && clip.cells[0].well).toEqual(well({ role: 'blank', pH: 6 }));
  });
});

describe('pasting wells', () => {
  it('when a block is pasted at a cell, then it lands with that cell as its top-left corner', () => {
    const r = pasteClip(emptyPlateMap(), mustCopy(source, block), { row: 4, column: 6 }, 96);
    expect(r.map.wells).toEqual({ E7: source.wells.B2, F7: source.wells.C2, F8: source.wells.C3 });
    expect(r.wells).toEqual(['E7', 'E8', 'F7', 'F8']);
    expect(r.leftOut).toBe(0);
  });

  it('when the copied block has an empty well, then the paste empties the well under it', () => {
    const target: PlateMap = { wells: { E8: well({ pH: 9 }), A1: well({ pH: 4 }) }, replicatesRequired: 3 };
    const r = pasteClip(target, mustCopy(source, block), { row: 4, column: 6 }, 96);
    expect(r.map.wells.E8).toBeUndefined();
    expect(r.map.wells.A1).toEqual(well({ pH: 4 }));
    expect(target.wells.E8).toEqual(well({ pH: 9 }));
  });

  it('when a block is pasted at the corner, then the wells that fall off the plate are left out and counted', () => {
    const r = pasteClip(emptyPlateMap(), mustCopy(source, block), { row: 7, column: 11 }, 96);
    expect(r.wells).toEqual(['H12']);
    expect(r.map.wells).toEqual({ H12: source.wells.B2 });
    expect(r.leftOut).toBe(3);
  });

  it('when a clip has negative offsets (edited by hand), then the wells left or above the plate are left out', () => {
    const clip: Clip = {
      kind: 'bellwether-wells',
      cells: [
        { dr: -1, dc: 0, well: well({ pH: 5 }) },
        { dr: 0, dc: -1, well: null },
      ],
    };
    const r = pasteClip(emptyPlateMap(), clip, { row: 0, column: 0 }, 96);
    expect(r).toMatchObject({ wells: [], leftOut: 2 });
    expect(r.map.wells).toEqual({});
  });

  it('when a 384-well block is pasted onto a 96-well plate, then the part beyond H12 is left out', () => {
    const wide: PlateMap = {
      wells: { A12: well({ pH: 4 }), A13: well({ pH: 5 }), I1: well({ pH: 6 }) },
      replicatesRequired: 3,
    };
    const clip = mustCopy(wide, ['A12', 'A13', 'I1'], 384);
    const r = pasteClip(emptyPlateMap(), parseClip(clipText(clip)) as Clip, { row: 0, column: 0 }, 96);
    // The block spans A1–I13 of the source; pasted at A1, A13 and I1 fall off a 96-well plate.
    expect(r.map.wells).toEqual({ A12: well({ pH: 4 }) });
    expect(r.leftOut).toBe(2);
  });
});

describe('pasting a whole map', () => {
  it('when a whole map is pasted, then it replaces the map: its wells and its replicates required, the rest empty', () => {
    const target: PlateMap = { wells: { A1: well({ pH: 4 }), B2: well({ pH: 9 }) }, replicatesRequired: 3 };
    const r = pasteClip(target, copyWholeMap(source, 96), { row: 5, column: 5 }, 96);
    expect(r.map).toEqual(source);
    expect(r.wells.sort()).toEqual(['B2', 'C2', 'C3', 'H12']);
    expect(r.leftOut).toBe(0);
    expect(target.wells.A1).toEqual(well({ pH: 4 }));
  });

  it('when a 384-well map is pasted onto a 96-well plate, then its wells beyond H12 are left out', () => {
    const big: PlateMap = {
      wells: { A1: well({ pH: 4 }), P24: well({ pH: 5 }), A13: well({ pH: 6 }) },
      replicatesRequired: 2,
    };
    const r = pasteClip(emptyPlateMap(), copyWholeMap(big, 384), { row: 0, column: 0 }, 96);
    expect(r.map.wells).toEqual({ A1: well({ pH: 4 }) });
    expect(r.leftOut).toBe(2);
    expect(r.map.replicatesRequired).toBe(2);
  });

  it('when a full 384-well plate is copied and pasted into an empty one, then all 384 wells come back', () => {
    const full: PlateMap = {
      wells: Object.fromEntries(allNames(384).map((n, i) => [n, well({ pH: 3 + (i % 24) * 0.25 })])),
      replicatesRequired: 3,
    };
    const clip = parseClip(clipText(mustCopy(full, allNames(384), 384)));
    expect(clip).not.toBeNull();
    const r = pasteClip(emptyPlateMap(), clip as Clip, { row: 0, column: 0 }, 384);
    expect(r.map.wells).toEqual(full.wells);
    expect(r.leftOut).toBe(0);
  });
});

describe('the remembered clip', () => {
  it('when a clip is remembered, then the last one is given back for a paste', () => {
    const first = mustCopy(source, ['B2']);
    const second = copyWholeMap(source, 96);
    rememberClip(first);
    expect(rememberedClip()).toBe(first);
    rememberClip(second);
    expect(rememberedClip()).toBe(second);
  });
});
