// Copy and paste of wells. A copy holds the selected wells relative to the selection's top-left
// corner (empty wells too, so a paste reproduces the block exactly); a whole-map copy (kept when
// a save is refused) pastes back onto the same wells. Both travel as JSON text, so they also go
// through the system clipboard, into another plate or another tab.
import { z } from 'zod';
import type { PlateFormat } from '@shared/plate/geometry';
import {
  plateMapSchema,
  wellAssignmentSchema,
  type PlateMap,
  type WellAssignment,
} from '@shared/plate-map/schema';
import { boundsOf, cellName, cellOf, clampCell, type Cell } from './grid';

const clipSchema = z.discriminatedUnion('kind', [
  z.object({
    kind: z.literal('bellwether-wells'),
    cells: z.array(z.object({ dr: z.int(), dc: z.int(), well: wellAssignmentSchema.nullable() })).max(384),
  }),
  z.object({
    kind: z.literal('bellwether-map'),
    format: z.union([z.literal(96), z.literal(384)]),
    map: plateMapSchema,
  }),
]);

export type Clip = z.output<typeof clipSchema>;

export function copyWells(map: PlateMap, names: readonly string[], format: PlateFormat): Clip | null {
  const bounds = boundsOf(names, format);
  if (!bounds) return null;
  const cells = names.flatMap((name) => {
    const c = cellOf(name, format);
    return c
      ? [{ dr: c.row - bounds.top.row, dc: c.column - bounds.top.column, well: map.wells[name] ?? null }]
      : [];
  });
  return { kind: 'bellwether-wells', cells };
}

export const copyWholeMap = (map: PlateMap, format: PlateFormat): Clip => ({
  kind: 'bellwether-map',
  format,
  map,
});

export const clipText = (clip: Clip) => JSON.stringify(clip);

export function parseClip(text: string): Clip | null {
  try {
    const parsed = clipSchema.safeParse(JSON.parse(text));
    return parsed.success ? parsed.data : null;
  } catch {
    return null;
  }
}

export type PasteResult = { map: PlateMap; wells: string[]; leftOut: number };

/**
 * Pastes a block at `at` (its top-left corner), or a whole map in place of this one; wells that
 * fall off the plate are left out.
 */
export function pasteClip(map: PlateMap, clip: Clip, at: Cell, format: PlateFormat): PasteResult {
  const wells: Record<string, WellAssignment> = { ...map.wells };
  const placed: string[] = [];
  let leftOut = 0;
  const put = (cell: Cell, well: WellAssignment | null) => {
    const inside = clampCell(cell, format);
    if (inside.row !== cell.row || inside.column !== cell.column) {
      leftOut += 1;
      return;
    }
    const name = cellName(cell);
    if (well) wells[name] = well;
    else delete wells[name];
    placed.push(name);
  };
  if (clip.kind === 'bellwether-map') {
    // A whole map replaces the map: wells it leaves empty become empty.
    for (const name of Object.keys(wells)) delete wells[name];
    for (const [name, well] of Object.entries(clip.map.wells)) {
      const cell = cellOf(name, format);
      if (cell) put(cell, well);
      else leftOut += 1;
    }
    return {
      map: { ...map, wells, replicatesRequired: clip.map.replicatesRequired },
      wells: placed,
      leftOut,
    };
  }
  for (const { dr, dc, well } of clip.cells) put({ row: at.row + dr, column: at.column + dc }, well);
  return { map: { ...map, wells }, wells: placed, leftOut };
}

/** The last copy in this tab, for pastes when the system clipboard cannot be read. */
let remembered: Clip | null = null;
export const rememberClip = (clip: Clip) => {
  remembered = clip;
};
export const rememberedClip = () => remembered;
