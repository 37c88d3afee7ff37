// The plate as a grid (rows A–H or A–P × columns 1–12 or 1–24). The wells are drawn on one
// canvas (utils/draw-plate.ts) so that painting 384 wells stays well under a frame budget; over it
// lies a layer of empty, memoised cells that carry the grid's meaning for assistive technology
// (role, name, selected) and receive the pointer. Pointer events are handled once, on the grid,
// from their position; the keyboard stays on the grid, with aria-activedescendant naming the
// well at the cursor. Copy, cut and paste are the browser's own events while the grid has focus.
import { memo, useEffect, useId, useLayoutEffect, useRef, useState, type KeyboardEvent } from 'react';
import { plateDimensions, type PlateFormat } from '@shared/plate/geometry';
import type { PlateMap, WellAssignment } from '@shared/plate-map/schema';
import { clearWellSprites, drawPlate, type GridGeometry } from '../utils/draw-plate';
import { cellName, type Cell } from '../utils/grid';
import { wellRoleLabels } from '../utils/roles';

export type GridHit =
  | { kind: 'cell'; cell: Cell }
  | { kind: 'row'; row: number }
  | { kind: 'column'; column: number }
  | { kind: 'corner' };

export type PlateGridProps = {
  format: PlateFormat;
  map: PlateMap;
  selected: ReadonlySet<string>;
  cursor: Cell;
  highlighted: ReadonlySet<string>;
  tags: Record<string, string>;
  variantNames: Record<string, string>;
  label: string;
  onPointerStart: (hit: GridHit, extend: boolean) => void;
  onPointerDrag: (cell: Cell) => void;
  onPointerEnd: () => void;
  onKeyDown: (event: KeyboardEvent<HTMLDivElement>) => void;
  onCopy?: (event: ClipboardEvent) => void;
  onCut?: (event: ClipboardEvent) => void;
  onPaste?: (event: ClipboardEvent) => void;
};

export const gridGeometry = (format: PlateFormat): GridGeometry => {
  const { rows, columns } = plateDimensions(format);
  const compact = format === 384;
  const cw = compact ? 27 : 54;
  const ch = compact ? 24 : 46;
  const left = 24;
  const top = 18;
  return {
    rows,
    columns,
    compact,
    cw,
    ch,
    left,
    top,
    width: left + columns * cw + 1,
    height: top + rows * ch + 1,
  };
};

export function describeWell(
  name: string,
  well: WellAssignment | undefined,
  variantName: string | null,
): string {
  if (!well) return `${name}, no role`;
  const parts = [name, wellRoleLabels[well.role]];
  if (variantName) parts.push(variantName);
  if (well.pH != null) parts.push(`pH ${well.pH}`);
  if (well.buffer) parts.push(well.buffer);
  if (well.replicate != null) parts.push(`replicate ${well.replicate}`);
  if (well.concentrationUm != null) parts.push(`${well.concentrationUm} µM`);
  return parts.join(', ');
}

type CellTargetProps = {
  id: string;
  name: string;
  label: string;
  selected: boolean;
  x: number;
  y: number;
  w: number;
  h: number;
};

/** An empty box over a drawn well: its name and state for screen readers and tests. */
const CellTarget = memo(function CellTarget({ id, name, label, selected, x, y, w, h }: CellTargetProps) {
  return (
    <div
      role="gridcell"
      id={id}
      data-well={name}
      aria-label={label}
      aria-selected={selected}
      style={{ position: 'absolute', left: x, top: y, width: w, height: h }}
    />
  );
});

export function PlateGrid(props: PlateGridProps) {
  const { format, map, selected, cursor, highlighted, tags, variantNames, onCopy, onCut, onPaste } = props;
  const g = gridGeometry(format);
  const idBase = useId();
  const gridRef = useRef<HTMLDivElement>(null);
  const canvasRef = useRef<HTMLCanvasElement>(null);
  const dragging = useRef<string | null>(null);
  const [hover, setHover] = useState<string | null>(null);
  const [focused, setFocused] = useState(false);
  const [scale] = useState(() => Math.max(1, Math.min(3, window.devicePixelRatio || 1)));
  const wellId = (name: string) => `${idBase}-${name}`;

  const [, setFontsReady] = useState(false);
  useEffect(() => {
    let live = true;
    void document.fonts?.ready.then(() => {
      if (!live) return;
      clearWellSprites();
      setFontsReady(true);
    });
    return () => {
      live = false;
    };
  }, []);

  useLayoutEffect(() => {
    const ctx = canvasRef.current?.getContext('2d');
    if (ctx) drawPlate(ctx, g, { map, selected, highlighted, cursor, tags, focused }, scale);
  });

  // Clipboard events go to the document (the grid is not editable); act while the grid has focus.
  const clipboard = useRef({ onCopy, onCut, onPaste });
  clipboard.current = { onCopy, onCut, onPaste };
  useEffect(() => {
    const mine = (kind: 'onCopy' | 'onCut' | 'onPaste') => (e: ClipboardEvent) => {
      if (document.activeElement === gridRef.current) clipboard.current[kind]?.(e);
    };
    const listeners = [
      ['copy', mine('onCopy')],
      ['cut', mine('onCut')],
      ['paste', mine('onPaste')],
    ] as const;
    for (const [type, listener] of listeners) document.addEventListener(type, listener);
    return () => {
      for (const [type, listener] of listeners) document.removeEventListener(type, listener);
    };
  }, []);

  const hitAt = (clientX: number, clientY: number): GridHit | null => {
    const box = gridRef.current?.getBoundingClientRect();
    if (!box) return null;
    const x = clientX - box.left;
    const y = clientY - box.top;
    const column = Math.floor((x - g.left) / g.cw);
    const row = Math.floor((y - g.top) / g.ch);
    const inColumns = column >= 0 && column < g.columns;
    const inRows = row >= 0 && row < g.rows;
    if (x < g.left && y < g.top) return { kind: 'corner' };
    if (x < g.left) return inRows ? { kind: 'row', row } : null;
    if (y < g.top) return inColumns ? { kind: 'column', column } : null;
    return inRows && inColumns ? { kind: 'cell', cell: { row, column } } : null;
  };

  const rows = [];
  for (let row = 0; row < g.rows; row++) {
    const cells = [];
    for (let column = 0; column < g.columns; column++) {
      const name = cellName({ row, column });
      const well = map.wells[name];
      const variantName = well?.variantId
        ? (variantNames[well.variantId] ?? 'a variant not in this study')
        : null;
      cells.push(
        <CellTarget
          key={name}
          id={wellId(name)}
          name={name}
          label={describeWell(name, well, variantName)}
          selected={selected.has(name)}
          x={g.left + column * g.cw}
          y={g.top + row * g.ch}
          w={g.cw}
          h={g.ch}
        />,
      );
    }
    rows.push(
      <div role="row" key={row} className="contents">
        {cells}
      </div>,
    );
  }

  const hovered = hover ? map.wells[hover] : undefined;
  return (
    <div>
      <div
        ref={gridRef}
        role="grid"
        aria-label={props.label}
        aria-multiselectable="true"
        aria-rowcount={g.rows}
        aria-colcount={g.columns}
        aria-activedescendant={wellId(cellName(cursor))}
        tabIndex={0}
        className="relative cursor-cell touch-none rounded outline-offset-4 select-none"
        // A fixed-size box: style and layout changes inside it never reach the rest of the page.
        style={{ width: g.width, height: g.height, contain: 'strict' }}
        onKeyDown={props.onKeyDown}
        onFocus={() => setFocused(true)}
        onBlur={() => setFocused(false)}
        onPointerDown={(e) => {
          if (e.button !== 0) return;
          const hit = hitAt(e.clientX, e.clientY);
          if (!hit) return;
          e.currentTarget.focus();
          e.currentTarget.setPointerCapture(e.pointerId);
          dragging.current = hit.kind === 'cell' ? cellName(hit.cell) : '';
          props.onPointerStart(hit, e.shiftKey);
          e.preventDefault();
        }}
        onPointerMove={(e) => {
          const hit = hitAt(e.clientX, e.clientY);
          const name = hit?.kind === 'cell' ? cellName(hit.cell) : null;
          if (name !== hover) setHover(name);
          if (dragging.current && name && name !== dragging.current) {
            dragging.current = name;
            props.onPointerDrag((hit as { cell: Cell }).cell);
          }
        }}
        onPointerUp={() => {
          if (dragging.current === null) return;
          dragging.current = null;
          props.onPointerEnd();
        }}
        onPointerLeave={() => setHover(null)}
      >
        <canvas
          ref={canvasRef}
          aria-hidden="true"
          width={Math.round(g.width * scale)}
          height={Math.round(g.height * scale)}
          className="absolute inset-0"
          // Its own layer: redrawing the wells repaints nothing else.
          style={{ width: g.width, height: g.height, willChange: 'transform' }}
        />
        {rows}
      </div>
      <p className="mt-1 h-5 truncate text-sm text-ink-muted" aria-hidden="true">
        {hover
          ? describeWell(
              hover,
              hovered,
              hovered?.variantId ? (variantNames[hovered.variantId] ?? null) : null,
            )
          : 'Drag to select a rectangle; click a row letter or column number to select it whole.'}
      </p>
    </div>
  );
}
