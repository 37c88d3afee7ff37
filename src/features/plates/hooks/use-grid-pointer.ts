// The pointer on the grid: a press starts a selection (a well, a whole row or column, or all
// wells from the corner); dragging grows the rectangle from the anchor; with the Paint tool,
// letting go paints what was selected.
import { useRef } from 'react';
import { plateDimensions, type PlateFormat } from '@shared/plate/geometry';
import type { GridHit } from '../components/plate-grid';
import { rectNames, type Cell } from '../utils/grid';
import type { useSelection } from './use-selection';

type Selection = ReturnType<typeof useSelection>;

export function useGridPointer(
  format: PlateFormat,
  selection: Selection,
  onRelease: (wells: string[]) => void,
) {
  const pending = useRef<string[] | null>(null);
  const anchor = useRef<Cell | null>(null);

  const onPointerStart = (hit: GridHit, extend: boolean) => {
    if (hit.kind === 'cell') {
      const from = extend ? selection.anchor : hit.cell;
      anchor.current = from;
      if (extend) selection.extendTo(hit.cell);
      else selection.selectRect(hit.cell, hit.cell);
      pending.current = rectNames(from, hit.cell);
      return;
    }
    const { rows, columns } = plateDimensions(format);
    const [a, b]: [Cell, Cell] =
      hit.kind === 'row'
        ? [
            { row: hit.row, column: 0 },
            { row: hit.row, column: columns - 1 },
          ]
        : hit.kind === 'column'
          ? [
              { row: 0, column: hit.column },
              { row: rows - 1, column: hit.column },
            ]
          : [
              { row: 0, column: 0 },
              { row: rows - 1, column: columns - 1 },
            ];
    selection.selectRect(a, b);
    anchor.current = null;
    pending.current = rectNames(a, b);
  };
  const onPointerDrag = (cell: Cell) => {
    if (!anchor.current) return;
    selection.extendTo(cell);
    pending.current = rectNames(anchor.current, cell);
  };
  const onPointerEnd = () => {
    if (pending.current) onRelease(pending.current);
    pending.current = null;
    anchor.current = null;
  };
  return { onPointerStart, onPointerDrag, onPointerEnd };
}
