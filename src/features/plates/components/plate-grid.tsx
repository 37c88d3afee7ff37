// The plate as one SVG grid (rows A–H or A–P × columns 1–12 or 1–24). Pointer events are handled
// once on the SVG (the well under the pointer is computed from its position), never per well,
// and each well is a memoised cell, so painting 384 wells stays cheap. Keyboard focus stays on the
// SVG, with aria-activedescendant naming the well at the cursor.
import { useId, useRef, useState, type KeyboardEvent, type ClipboardEvent } from 'react';
import { plateDimensions, type PlateFormat } from '@shared/plate/geometry';
import type { PlateMap } from '@shared/plate-map/schema';
import { cellName, rowLetter, type Cell } from '../utils/grid';
import { describeWell, WellCell } from './well-cell';

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
  onKeyDown: (event: KeyboardEvent<SVGSVGElement>) => void;
  onCopy?: (event: ClipboardEvent<SVGSVGElement>) => void;
  onCut?: (event: ClipboardEvent<SVGSVGElement>) => void;
  onPaste?: (event: ClipboardEvent<SVGSVGElement>) => void;
};

export const gridGeometry = (format: PlateFormat) => {
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

export function PlateGrid(props: PlateGridProps) {
  const { format, map, selected, cursor, highlighted, tags, variantNames } = props;
  const g = gridGeometry(format);
  const idBase = useId();
  const svgRef = useRef<SVGSVGElement>(null);
  const dragging = useRef<string | null>(null);
  const [hover, setHover] = useState<string | null>(null);
  const wellId = (name: string) => `${idBase}-${name}`;

  const hitAt = (clientX: number, clientY: number): GridHit | null => {
    const box = svgRef.current?.getBoundingClientRect();
    if (!box) return null;
    const x = ((clientX - box.left) * g.width) / box.width;
    const y = ((clientY - box.top) * g.height) / box.height;
    const column = Math.floor((x - g.left) / g.cw);
    const row = Math.floor((y - g.top) / g.ch);
    const inColumns = column >= 0 && column < g.columns;
    const inRows = row >= 0 && row < g.rows;
    if (x < g.left && y < g.top) return { kind: 'corner' };
    if (x < g.left) return inRows ? { kind: 'row', row } : null;
    if (y < g.top) return inColumns ? { kind: 'column', column } : null;
    return inRows && inColumns ? { kind: 'cell', cell: { row, column } } : null;
  };

  const cells = [];
  for (let row = 0; row < g.rows; row++) {
    const rowCells = [];
    for (let column = 0; column < g.columns; column++) {
      const name = cellName({ row, column });
      const well = map.wells[name];
      const variantId = well?.variantId ?? null;
      rowCells.push(
        <WellCell
          key={name}
          id={wellId(name)}
          name={name}
          x={g.left + column * g.cw}
          y={g.top + row * g.ch}
          w={g.cw}
          h={g.ch}
          well={well}
          tag={variantId ? (tags[variantId] ?? '?') : null}
          variantName={variantId ? (variantNames[variantId] ?? 'unknown variant') : null}
          selected={selected.has(name)}
          cursor={row === cursor.row && column === cursor.column}
          highlighted={highlighted.has(name)}
          compact={g.compact}
        />,
      );
    }
    cells.push(
      <g role="row" key={row}>
        <text
          role="rowheader"
          x={g.left - 7}
          y={g.top + row * g.ch + g.ch / 2 + 4}
          textAnchor="end"
          fontSize={11}
          fill="#4f5a5c"
        >
          {rowLetter(row)}
        </text>
        {rowCells}
      </g>,
    );
  }

  return (
    <div>
      <svg
        ref={svgRef}
        role="grid"
        aria-label={props.label}
        aria-multiselectable="true"
        aria-rowcount={g.rows}
        aria-colcount={g.columns}
        aria-activedescendant={wellId(cellName(cursor))}
        tabIndex={0}
        width={g.width}
        height={g.height}
        viewBox={`0 0 ${g.width} ${g.height}`}
        className="block max-w-full cursor-cell touch-none select-none rounded outline-offset-4"
        onKeyDown={props.onKeyDown}
        onCopy={props.onCopy}
        onCut={props.onCut}
        onPaste={props.onPaste}
        onPointerDown={(e) => {
          if (e.button !== 0) return;
          const hit = hitAt(e.clientX, e.clientY);
          if (!hit) return;
          e.currentTarget.focus();
          e.currentTarget.setPointerCapture(e.pointerId);
          dragging.current = hit.kind === 'cell' ? cellName(hit.cell) : null;
          props.onPointerStart(hit, e.shiftKey);
          e.preventDefault();
        }}
        onPointerMove={(e) => {
          const hit = hitAt(e.clientX, e.clientY);
          const name = hit?.kind === 'cell' ? cellName(hit.cell) : null;
          if (name !== hover) setHover(name);
          if (dragging.current && hit?.kind === 'cell' && name !== dragging.current) {
            dragging.current = name;
            props.onPointerDrag(hit.cell);
          }
        }}
        onPointerUp={() => {
          if (dragging.current === null) return;
          dragging.current = null;
          props.onPointerEnd();
        }}
        onPointerLeave={() => setHover(null)}
      >
        <rect
          x={g.left}
          y={g.top}
          width={g.columns * g.cw}
          height={g.rows * g.ch}
          fill="#fbfcfb"
          stroke="#d8ddda"
        />
        <g role="row">
          {Array.from({ length: g.columns }, (_, column) => (
            <text
              key={column}
              role="columnheader"
              x={g.left + column * g.cw + g.cw / 2}
              y={g.top - 5}
              textAnchor="middle"
              fontSize={g.compact ? 9.5 : 11}
              fill="#4f5a5c"
            >
              {column + 1}
            </text>
          ))}
        </g>
        {cells}
      </svg>
      <p className="mt-1 h-5 truncate text-sm text-ink-muted" aria-hidden="true">
        {hover
          ? describeWell(
              hover,
              map.wells[hover],
              (map.wells[hover]?.variantId && variantNames[map.wells[hover].variantId!]) || null,
            )
          : 'Drag to select a rectangle; click a row letter or column number to select it whole.'}
      </p>
    </div>
  );
}
