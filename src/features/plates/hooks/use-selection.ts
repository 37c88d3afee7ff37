// Which wells are selected: a rectangle from an anchor to the cursor (mouse drag, shift+arrows),
// or a given set (a whole row or column, the wells a check names).
import { useCallback, useMemo, useState } from 'react';
import type { PlateFormat } from '@shared/plate/geometry';
import { allNames, cellOf, clampCell, rectNames, type Cell } from '../utils/grid';

type SelectionState = { anchor: Cell; cursor: Cell; names: string[] };

const origin: Cell = { row: 0, column: 0 };

export function useSelection(format: PlateFormat) {
  const [state, setState] = useState<SelectionState>({ anchor: origin, cursor: origin, names: ['A1'] });
  const set = useMemo(() => new Set(state.names), [state.names]);

  const selectRect = useCallback(
    (anchor: Cell, cursor: Cell) => setState({ anchor, cursor, names: rectNames(anchor, cursor) }),
    [],
  );
  const extendTo = useCallback(
    (cell: Cell) => setState((s) => ({ anchor: s.anchor, cursor: cell, names: rectNames(s.anchor, cell) })),
    [],
  );
  /** Arrow keys: move the cursor (and the selection with it), or extend from the anchor. */
  const move = useCallback(
    (dRow: number, dColumn: number, extend: boolean) =>
      setState((s) => {
        const cursor = clampCell({ row: s.cursor.row + dRow, column: s.cursor.column + dColumn }, format);
        const anchor = extend ? s.anchor : cursor;
        return { anchor, cursor, names: rectNames(anchor, cursor) };
      }),
    [format],
  );
  const selectNames = useCallback(
    (names: string[]) => {
      const cells = names.map((n) => cellOf(n, format)).filter((c): c is Cell => c !== null);
      if (cells.length === 0) return;
      setState({ anchor: cells[0], cursor: cells[0], names });
    },
    [format],
  );
  const selectAll = useCallback(() => setState((s) => ({ ...s, names: allNames(format) })), [format]);

  return {
    anchor: state.anchor,
    cursor: state.cursor,
    names: state.names,
    set,
    selectRect,
    extendTo,
    move,
    selectNames,
    selectAll,
  };
}
