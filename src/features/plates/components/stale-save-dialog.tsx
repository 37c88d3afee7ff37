// A save refused with 409: someone saved this plate since the editor opened it. Reload their
// version, optionally keeping ours in the clipboard (paste it back with Ctrl+V), or keep editing.
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';

export type StaleSaveDialogProps = {
  open: boolean;
  message: string;
  busy?: boolean;
  onReload: (keepCopy: boolean) => void;
  onKeepEditing: () => void;
};

export function StaleSaveDialog({ open, message, busy, onReload, onKeepEditing }: StaleSaveDialogProps) {
  return (
    <Dialog
      open={open}
      onClose={onKeepEditing}
      title="Someone saved since"
      width="md"
      footer={
        <>
          <Button onClick={onKeepEditing}>Keep editing</Button>
          <Button busy={busy} onClick={() => onReload(false)}>
            Reload, drop my changes
          </Button>
          <Button variant="primary" busy={busy} onClick={() => onReload(true)}>
            Copy mine to the clipboard and reload
          </Button>
        </>
      }
    >
      <div className="space-y-2">
        <p>{message}</p>
        <p className="text-ink-muted">
          Reload to see the saved map. Your version can go to the clipboard first: after the reload, select
          the map and press Ctrl+V (⌘V) to put your version back, then save.
        </p>
      </div>
    </Dialog>
  );
}
