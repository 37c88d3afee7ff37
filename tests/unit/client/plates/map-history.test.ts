// The plate editor's undo and redo (src/features/plates/hooks/use-map-history.ts): each edit is
// one step, a new edit drops the redo steps, and the copy is unsaved while it is not the map last
// loaded or saved. Maps are compared by identity, as the hook does.
import { describe, expect, it } from 'vitest';
import type { PlateMap } from '@shared/plate-map/schema';
import {
  HISTORY_LIMIT,
  mapHistoryReducer as reduce,
  type MapHistoryState,
} from '@/features/plates/hooks/use-map-history';

const map = (wells: string[]): PlateMap =>
  ({ wells: Object.fromEntries(wells.map((w) => [w, { role: 'blank' }])) }) as unknown as PlateMap;
const start = (m: PlateMap): MapHistoryState => ({ map: m, past: [], future: [], saved: m, version: 3 });
const dirty = (s: MapHistoryState) => s.map !== s.saved;

describe('map history', () => {
  const a = map([]);
  const b = map(['A1']);
  const c = map(['A1', 'A2']);
  const d = map(['H12']);

  it('when two edits are undone and one redone, then the maps come back in order', () => {
    let s = reduce(reduce(start(a), { type: 'edit', map: b }), { type: 'edit', map: c });
    expect(s.map).toBe(c);
    s = reduce(s, { type: 'undo' });
    expect(s.map).toBe(b);
    s = reduce(s, { type: 'undo' });
    expect(s.map).toBe(a);
    expect(dirty(s)).toBe(false); // back at the saved map: clean again
    expect(reduce(s, { type: 'undo' })).toBe(s); // nothing left to undo
    s = reduce(s, { type: 'redo' });
    expect(s.map).toBe(b);
    expect(dirty(s)).toBe(true);
    expect(s.future).toEqual([c]);
  });

  it('when a new edit follows an undo, then the undone steps cannot be redone', () => {
    let s = reduce(reduce(start(a), { type: 'edit', map: b }), { type: 'undo' });
    s = reduce(s, { type: 'edit', map: d });
    expect(s.future).toEqual([]);
    expect(reduce(s, { type: 'redo' })).toBe(s);
    expect(reduce(s, { type: 'undo' }).map).toBe(a);
  });

  it('when an edit returns the same map, then no undo step is added', () => {
    const s = start(a);
    expect(reduce(s, { type: 'edit', map: a })).toBe(s);
  });

  it('when the map is saved while editing goes on, then only the copy that was sent counts as saved', () => {
    let s = reduce(reduce(start(a), { type: 'edit', map: b }), { type: 'edit', map: c });
    s = reduce(s, { type: 'saved', map: b, version: 4 });
    expect(s.version).toBe(4);
    expect(dirty(s)).toBe(true); // c was made after b was sent
    s = reduce(s, { type: 'undo' });
    expect(dirty(s)).toBe(false);
    expect(s.past).toEqual([a]); // saving keeps the undo steps
  });

  it('when a map is loaded after a reload, then the history starts over at its version', () => {
    const s = reduce(reduce(start(a), { type: 'edit', map: b }), { type: 'load', map: d, version: 9 });
    expect(s).toEqual({ map: d, past: [], future: [], saved: d, version: 9 });
  });

  it(`when more than ${HISTORY_LIMIT} edits are made, then the oldest steps are dropped`, () => {
    const maps = Array.from({ length: HISTORY_LIMIT + 5 }, (_, i) => map([`A${(i % 12) + 1}`]));
    let s = start(a);
    for (const m of maps) s = reduce(s, { type: 'edit', map: m });
    expect(s.past).toHaveLength(HISTORY_LIMIT);
    for (let i = 0; i < HISTORY_LIMIT; i++) s = reduce(s, { type: 'undo' });
    expect(s.map).toBe(maps[4]); // a and the first four edits are beyond the limit
    expect(reduce(s, { type: 'undo' })).toBe(s);
  });
});
