// The editor's commands: undo and redo, copy and paste, fills and patterns, templates, the
// replicates the checks ask for, and Save with the version the editor started from.
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';

export type EditorToolbarProps = {
  canUndo: boolean;
  canRedo: boolean;
  dirty: boolean;
  saving: boolean;
  version: number;
  replicatesRequired: number;
  onUndo: () => void;
  onRedo: () => void;
  onCopy: () => void;
  onPaste: () => void;
  onClear: () => void;
  onFill: () => void;
  onPattern: () => void;
  onApplyTemplate: () => void;
  onSaveTemplate: () => void;
  onReplicatesRequired: (n: number) => void;
  onSave: () => void;
};

const mod = typeof navigator !== 'undefined' && /Mac/.test(navigator.platform) ? '⌘' : 'Ctrl+';

export function EditorToolbar(p: EditorToolbarProps) {
  return (
    <div className="flex flex-wrap items-center gap-2" role="toolbar" aria-label="Map commands">
      <Button size="sm" onClick={p.onUndo} disabled={!p.canUndo} title={`Undo (${mod}Z)`}>
        Undo
      </Button>
      <Button size="sm" onClick={p.onRedo} disabled={!p.canRedo} title={`Redo (${mod}Shift+Z)`}>
        Redo
      </Button>
      <span className="mx-1 h-5 w-px bg-line" aria-hidden="true" />
      <Button size="sm" onClick={p.onCopy} title={`Copy the selected wells (${mod}C)`}>
        Copy
      </Button>
      <Button size="sm" onClick={p.onPaste} title={`Paste at the selection (${mod}V)`}>
        Paste
      </Button>
      <Button size="sm" onClick={p.onClear} title="Clear the selected wells (Delete)">
        Clear
      </Button>
      <span className="mx-1 h-5 w-px bg-line" aria-hidden="true" />
      <Button size="sm" onClick={p.onFill}>
        Fill pH series…
      </Button>
      <Button size="sm" onClick={p.onPattern}>
        Replicate pattern…
      </Button>
      <Button size="sm" onClick={p.onApplyTemplate}>
        Apply template…
      </Button>
      <Button size="sm" onClick={p.onSaveTemplate}>
        Save as template…
      </Button>
      <label className="ml-2 flex items-center gap-1.5 text-sm text-ink-muted">
        Replicates required
        <select
          className="h-7 rounded border border-line-strong bg-surface px-1 text-ink"
          value={p.replicatesRequired}
          onChange={(e) => p.onReplicatesRequired(Number(e.target.value))}
        >
          {Array.from({ length: 8 }, (_, i) => (
            <option key={i} value={i + 1}>
              {i + 1}
            </option>
          ))}
        </select>
      </label>
      <span className="ml-auto flex items-center gap-2">
        {p.dirty ? (
          <Badge tone="warning">Unsaved changes</Badge>
        ) : (
          <span className="text-sm text-ink-muted">Saved · version {p.version}</span>
        )}
        <Button
          variant="primary"
          size="sm"
          onClick={p.onSave}
          busy={p.saving}
          disabled={!p.dirty}
          title={`Save the map (${mod}S)`}
        >
          Save map
        </Button>
      </span>
    </div>
  );
}
