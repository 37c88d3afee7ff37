// Draws the plate map on a canvas: one pass over the wells, no DOM per well, so a paint of all
// 384 wells costs a few milliseconds. The visual code: shape and letter for the role (filled
// disc = sample, ring = blank without enzyme, dashed ring = buffer only, square = standard,
// crossed disc = unused), fill or ring colour for the pH (the one pH scale), the variant's label
// in the disc, the pH under it and the replicate number in the corner (96 wells).
import type { PlateMap, WellAssignment } from '@shared/plate-map/schema';
import { inkOnPh, phColor } from '@/components/ui/ph-scale';
import { cellName, rowLetter, type Cell } from './grid';
import { roleKeys } from './roles';

export type GridGeometry = {
  rows: number;
  columns: number;
  compact: boolean;
  cw: number;
  ch: number;
  left: number;
  top: number;
  width: number;
  height: number;
};

export type DrawInput = {
  map: PlateMap;
  selected: ReadonlySet<string>;
  highlighted: ReadonlySet<string>;
  cursor: Cell;
  tags: Record<string, string>;
  focused: boolean;
};

const INK = '#1b2224';
const MUTED = '#4f5a5c';
const LINE = '#d8ddda';
const EMPTY_STROKE = '#b9c1bd';
const NO_PH = '#9aa3a1';
const SELECTED = '#acd5d0';
const HIGHLIGHT = '#a86d00';
const FONT = '"Source Sans 3", ui-sans-serif, system-ui, sans-serif';

// phColor converts OKLCH each time; a map has a handful of distinct pH values.
const colourCache = new Map<number, { fill: string; ink: string }>();
function phColours(pH: number | null) {
  if (pH == null) return { fill: NO_PH, ink: INK };
  let c = colourCache.get(pH);
  if (!c) {
    c = { fill: phColor(pH), ink: inkOnPh(pH) };
    colourCache.set(pH, c);
  }
  return c;
}

const phText = (pH: number) => pH.toFixed(Math.round(pH * 10) === pH * 10 ? 1 : 2);

function centreText(well: WellAssignment, tag: string | undefined, compact: boolean): string {
  if (well.role === 'sample') return tag ?? '?';
  if (well.role === 'standard' && well.concentrationUm != null && !compact)
    return String(well.concentrationUm);
  if (well.role === 'unused') return '';
  return roleKeys[well.role];
}

function drawShape(
  ctx: CanvasRenderingContext2D,
  well: WellAssignment | undefined,
  cx: number,
  cy: number,
  r: number,
) {
  ctx.setLineDash([]);
  ctx.lineWidth = 1;
  if (!well) {
    ctx.beginPath();
    ctx.arc(cx, cy, r, 0, 2 * Math.PI);
    ctx.fillStyle = '#ffffff';
    ctx.fill();
    ctx.strokeStyle = EMPTY_STROKE;
    ctx.stroke();
    return;
  }
  const { fill } = phColours(well.pH);
  switch (well.role) {
    case 'sample':
      ctx.beginPath();
      ctx.arc(cx, cy, r, 0, 2 * Math.PI);
      ctx.fillStyle = fill;
      ctx.fill();
      return;
    case 'blank':
    case 'buffer':
      ctx.beginPath();
      ctx.arc(cx, cy, r - 1.5, 0, 2 * Math.PI);
      ctx.fillStyle = '#ffffff';
      ctx.fill();
      ctx.lineWidth = 3;
      if (well.role === 'buffer') ctx.setLineDash([3.2, 2.2]);
      ctx.strokeStyle = fill;
      ctx.stroke();
      return;
    case 'standard':
      ctx.beginPath();
      ctx.roundRect(cx - r, cy - r, 2 * r, 2 * r, 2);
      ctx.fillStyle = '#e4e8e6';
      ctx.fill();
      ctx.lineWidth = 1.5;
      ctx.strokeStyle = well.pH == null ? MUTED : fill;
      ctx.stroke();
      return;
    case 'unused': {
      const d = r * 0.62;
      ctx.beginPath();
      ctx.arc(cx, cy, r, 0, 2 * Math.PI);
      ctx.fillStyle = '#eef0ee';
      ctx.fill();
      ctx.strokeStyle = EMPTY_STROKE;
      ctx.stroke();
      ctx.beginPath();
      ctx.moveTo(cx - d, cy - d);
      ctx.lineTo(cx + d, cy + d);
      ctx.moveTo(cx + d, cy - d);
      ctx.lineTo(cx - d, cy + d);
      ctx.lineWidth = 1.2;
      ctx.strokeStyle = NO_PH;
      ctx.stroke();
    }
  }
}

/** What a well looks like, apart from selection and highlight (drawn around it). */
function appearanceKey(well: WellAssignment | undefined, tag: string | undefined): string {
  if (!well) return '';
  return `${well.role}|${well.pH}|${tag ?? ''}|${well.replicate}|${well.concentrationUm}`;
}

function drawWellFace(
  ctx: CanvasRenderingContext2D,
  g: GridGeometry,
  well: WellAssignment | undefined,
  tag: string | undefined,
) {
  const cx = g.cw / 2;
  const cy = g.ch / 2;
  const r = Math.min(g.cw, g.ch) / 2 - (g.compact ? 1.5 : 3);
  drawShape(ctx, well, cx, cy, r);
  ctx.setLineDash([]);
  if (!well) return;
  const onFill = well.role === 'sample' && well.pH != null ? phColours(well.pH).ink : INK;
  const centre = centreText(well, tag, g.compact);
  const withPh = !g.compact && well.pH != null && well.role !== 'standard';
  ctx.textAlign = 'center';
  ctx.fillStyle = onFill;
  if (centre) {
    ctx.font = `600 ${g.compact ? 8 : centre.length > 5 ? 9 : 10.5}px ${FONT}`;
    ctx.fillText(centre, cx, withPh ? cy + 1 : cy + 3.5);
  }
  if (withPh) {
    ctx.font = `400 8.5px ${FONT}`;
    ctx.fillText(phText(well.pH!), cx, cy + 11.5);
  }
  if (!g.compact && well.replicate != null) {
    ctx.font = `400 8.5px ${FONT}`;
    ctx.fillStyle = MUTED;
    ctx.textAlign = 'right';
    ctx.fillText(String(well.replicate), g.cw - 3, 9);
  }
}

// Each distinct well face is drawn once into a small canvas and then copied (drawImage is far
// cheaper than shapes and text): a map has a few dozen faces, however many wells show them.
const sprites = new Map<string, HTMLCanvasElement>();
function sprite(g: GridGeometry, well: WellAssignment | undefined, tag: string | undefined, scale: number) {
  const key = `${g.cw}x${g.ch}@${scale}|${appearanceKey(well, tag)}`;
  let canvas = sprites.get(key);
  if (!canvas) {
    if (sprites.size > 4000) sprites.clear();
    canvas = document.createElement('canvas');
    canvas.width = Math.ceil(g.cw * scale);
    canvas.height = Math.ceil(g.ch * scale);
    const ctx = canvas.getContext('2d');
    if (ctx) {
      ctx.scale(scale, scale);
      drawWellFace(ctx, g, well, tag);
    }
    sprites.set(key, canvas);
  }
  return canvas;
}

/** Faces drawn before the web font arrived are drawn again with it. */
export const clearWellSprites = () => sprites.clear();

function drawWell(
  ctx: CanvasRenderingContext2D,
  g: GridGeometry,
  input: DrawInput,
  row: number,
  column: number,
  scale: number,
) {
  const name = cellName({ row, column });
  const well = input.map.wells[name];
  const x = g.left + column * g.cw;
  const y = g.top + row * g.ch;
  if (input.selected.has(name)) {
    ctx.fillStyle = SELECTED;
    ctx.fillRect(x + 0.5, y + 0.5, g.cw - 1, g.ch - 1);
  }
  ctx.drawImage(
    sprite(g, well, well?.variantId ? input.tags[well.variantId] : undefined, scale),
    x,
    y,
    g.cw,
    g.ch,
  );
  if (input.highlighted.has(name)) {
    ctx.setLineDash([4, 2]);
    ctx.lineWidth = 2;
    ctx.strokeStyle = HIGHLIGHT;
    ctx.strokeRect(x + 1.5, y + 1.5, g.cw - 3, g.ch - 3);
    ctx.setLineDash([]);
  }
}

/** Draws the whole plate; `scale` is the device pixel ratio. */
export function drawPlate(ctx: CanvasRenderingContext2D, g: GridGeometry, input: DrawInput, scale: number) {
  ctx.setTransform(scale, 0, 0, scale, 0, 0);
  ctx.clearRect(0, 0, g.width, g.height);
  ctx.fillStyle = '#fbfcfb';
  ctx.fillRect(g.left, g.top, g.columns * g.cw, g.rows * g.ch);
  ctx.strokeStyle = LINE;
  ctx.lineWidth = 1;
  ctx.strokeRect(g.left + 0.5, g.top + 0.5, g.columns * g.cw, g.rows * g.ch);
  ctx.fillStyle = MUTED;
  ctx.textAlign = 'center';
  ctx.font = `400 ${g.compact ? 9.5 : 11}px ${FONT}`;
  for (let c = 0; c < g.columns; c++) ctx.fillText(String(c + 1), g.left + c * g.cw + g.cw / 2, g.top - 5);
  ctx.textAlign = 'right';
  ctx.font = `400 11px ${FONT}`;
  for (let r = 0; r < g.rows; r++) ctx.fillText(rowLetter(r), g.left - 7, g.top + r * g.ch + g.ch / 2 + 4);
  ctx.textAlign = 'center';
  for (let r = 0; r < g.rows; r++) for (let c = 0; c < g.columns; c++) drawWell(ctx, g, input, r, c, scale);
  // The cursor last, on top; dimmer when the grid does not have the keyboard.
  const x = g.left + input.cursor.column * g.cw;
  const y = g.top + input.cursor.row * g.ch;
  ctx.lineWidth = 2;
  ctx.strokeStyle = input.focused ? INK : MUTED;
  ctx.strokeRect(x + 1, y + 1, g.cw - 2, g.ch - 2);
}
