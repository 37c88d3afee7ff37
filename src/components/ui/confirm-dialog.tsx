import type { ReactNode } from 'react';
import { Button } from './button';
import { Dialog } from './dialog';
import { Notice } from './notice';

export type ConfirmDialogProps = {
  open: boolean;
  title: string;
  /** Say plainly what will happen, including the consequences. */
  children: ReactNode;
  confirmLabel: string;
  busy?: boolean;
  error?: string | null;
  onConfirm: () => void;
  onCancel: () => void;
};

export function ConfirmDialog({
  open,
  title,
  children,
  confirmLabel,
  busy,
  error,
  onConfirm,
  onCancel,
}: ConfirmDialogProps) {
  return (
    <Dialog
      open={open}
      onClose={onCancel}
      title={title}
      width="sm"
      footer={
        <>
          <Button onClick={onCancel}>Cancel</Button>
          <Button variant="primary" busy={busy} onClick={onConfirm}>
            {confirmLabel}
          </Button>
        </>
      }
    >
      <div className="space-y-3">
        {children}
        {error && <Notice tone="error">{error}</Notice>}
      </div>
    </Dialog>
  );
}
