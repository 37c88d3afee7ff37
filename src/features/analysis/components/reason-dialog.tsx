// A decision that needs a reason (exclude wells, include them again): the reason is required, and
// the audit log keeps it with who and when. Validated with the schema the server uses.
import { zodResolver } from '@hookform/resolvers/zod';
import type { ReactNode } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { exclusionLiftSchema } from '@shared/schemas/analysis';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { TextAreaField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';

type Values = z.input<typeof exclusionLiftSchema>;

export type ReasonDialogProps = {
  title: string;
  /** What will happen, in a sentence or two. */
  children: ReactNode;
  confirmLabel: string;
  busy: boolean;
  error: string | null;
  onConfirm: (reason: string) => void;
  onClose: () => void;
};

export function ReasonDialog({
  title,
  children,
  confirmLabel,
  busy,
  error,
  onConfirm,
  onClose,
}: ReasonDialogProps) {
  const form = useForm<Values>({ resolver: zodResolver(exclusionLiftSchema), defaultValues: { reason: '' } });
  const submit = form.handleSubmit(({ reason }) => onConfirm(reason.trim()));
  return (
    <Dialog
      open
      onClose={onClose}
      title={title}
      footer={
        <>
          <Button onClick={onClose}>Cancel</Button>
          <Button type="submit" form="reason-form" variant="primary" busy={busy}>
            {confirmLabel}
          </Button>
        </>
      }
    >
      <form id="reason-form" onSubmit={submit} noValidate className="space-y-3">
        <div>{children}</div>
        <TextAreaField
          label="Reason"
          autoFocus
          rows={3}
          hint="Required. It is kept in the audit log with your name and the time, and shown beside the point."
          error={form.formState.errors.reason?.message}
          {...form.register('reason')}
        />
        {error && <Notice tone="error">{error}</Notice>}
      </form>
    </Dialog>
  );
}
