// The grid's keyboard. Arrows move, Shift+arrows extend; role letters set the role; digits
// (or r, v, c and digits) type a value that Enter applies; Space paints the brush; Delete
// clears; Ctrl/⌘ with Z, Shift+Z or Y, A and S undo, redo, select all and save. Copy, cut and
// paste arrive as the browser's own clipboard events (see the editor).
import { useState, type KeyboardEvent } from 'react';
import type { WellPatch } from '../utils/edit-map';
import { roleByKey } from '../utils/roles';
import { typedStarts } from '../utils/typed-value';

export type EditorKeyActions = {
  readOnly: boolean;
  move: (dRow: number, dColumn: number, extend: boolean) => void;
  patch: (patch: WellPatch) => void;
  commitTyped: (text: string) => void;
  applyBrush: () => void;
  clear: () => void;
  undo: () => void;
  redo: () => void;
  selectAll: () => void;
  save: () => void;
  escape: () => void;
};

const arrows: Record<string, [number, number]> = {
  ArrowUp: [-1, 0],
  ArrowDown: [1, 0],
  ArrowLeft: [0, -1],
  ArrowRight: [0, 1],
};

export function useEditorKeys(actions: EditorKeyActions) {
  const [typed, setTyped] = useState<string | null>(null);

  const onKeyDown = (e: KeyboardEvent<HTMLDivElement>) => {
    const mod = e.ctrlKey || e.metaKey;
    const key = e.key;
    const handled = () => e.preventDefault();
    if (key in arrows) {
      const [dr, dc] = arrows[key];
      actions.move(dr, dc, e.shiftKey);
      return handled();
    }
    if (mod) {
      const k = key.toLowerCase();
      if (k === 'a') return (actions.selectAll(), handled());
      if (k === 's') return (actions.save(), handled());
      if (actions.readOnly) return;
      if ((k === 'z' && e.shiftKey) || k === 'y') return (actions.redo(), handled());
      if (k === 'z') return (actions.undo(), handled());
      return; // c, x, v: the browser raises copy, cut and paste events
    }
    if (e.altKey) return;
    if (key === 'Escape') {
      if (typed !== null) setTyped(null);
      else actions.escape();
      return handled();
    }
    if (actions.readOnly) return;
    if (typed !== null) {
      if (key === 'Enter') {
        actions.commitTyped(typed);
        setTyped(null);
        return handled();
      }
      if (key === 'Backspace') {
        setTyped(typed.length > 1 ? typed.slice(0, -1) : null);
        return handled();
      }
      if (/^[0-9.,]$/.test(key)) {
        setTyped(typed + key);
        return handled();
      }
    }
    if (typed === null && typedStarts.test(key)) {
      setTyped(key);
      return handled();
    }
    if (key === 'Delete' || key === 'Backspace') return (actions.clear(), handled());
    if (key === ' ') return (actions.applyBrush(), handled());
    const role = roleByKey[key.toLowerCase()];
    if (role) {
      setTyped(null);
      actions.patch({ role });
      return handled();
    }
  };

  return { typed, onKeyDown, cancelTyped: () => setTyped(null) };
}
