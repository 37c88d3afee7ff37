// The editor's working copy of the map with undo and redo. Each edit is one step; the copy is
// "unsaved" while it differs (by identity) from the map last loaded or saved, so undoing back to
// the saved map makes it clean again.
import { useCallback, useReducer } from 'react';
import type { PlateMap } from '@shared/plate-map/schema';

/** Undo steps kept; older ones are dropped. */
export const HISTORY_LIMIT = 200;

export type MapHistoryState = { map: PlateMap; past: PlateMap[]; future: PlateMap[]; saved: PlateMap; version: number };
export type MapHistoryAction =
  | { type: 'edit'; map: PlateMap }
  | { type: 'undo' }
  | { type: 'redo' }
  | { type: 'load'; map: PlateMap; version: number }
  | { type: 'saved'; version: number; map: PlateMap };

export function mapHistoryReducer(state: MapHistoryState, action: MapHistoryAction): MapHistoryState {
  switch (action.type) {
    case 'edit':
      if (action.map === state.map) return state;
      return { ...state, map: action.map, past: [...state.past.slice(-(HISTORY_LIMIT - 1)), state.map], future: [] };
    case 'undo': {
      const previous = state.past.at(-1);
      if (!previous) return state;
      return { ...state, map: previous, past: state.past.slice(0, -1), future: [state.map, ...state.future] };
    }
    case 'redo': {
      const [next, ...rest] = state.future;
      if (!next) return state;
      return { ...state, map: next, past: [...state.past, state.map], future: rest };
    }
    case 'load':
      return { map: action.map, past: [], future: [], saved: action.map, version: action.version };
    case 'saved':
      return { ...state, saved: action.map, version: action.version };
  }
}

export function useMapHistory(initial: PlateMap, version: number) {
  const [state, dispatch] = useReducer(mapHistoryReducer, {
    map: initial,
    past: [],
    future: [],
    saved: initial,
    version,
  });
  return {
    map: state.map,
    version: state.version,
    dirty: state.map !== state.saved,
    canUndo: state.past.length > 0,
    canRedo: state.future.length > 0,
    /** Replaces the working map with the result of an edit (one undo step). */
    edit: useCallback((map: PlateMap) => dispatch({ type: 'edit', map }), []),
    undo: useCallback(() => dispatch({ type: 'undo' }), []),
    redo: useCallback(() => dispatch({ type: 'redo' }), []),
    /** Starts over from a map fetched from the server (after a reload). */
    load: useCallback((map: PlateMap, v: number) => dispatch({ type: 'load', map, version: v }), []),
    /** The server stored `map` (the copy that was sent, even if editing went on) as version `v`. */
    markSaved: useCallback((map: PlateMap, v: number) => dispatch({ type: 'saved', version: v, map }), []),
  };
}
