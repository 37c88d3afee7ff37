// A plate's new name (the map, its version and the reads stay as they are).
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { plateRenameSchema } from '@shared/schemas/plates';
import type { PlateSummary } from '@shared/schemas/plates-types';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { applyServerErrors } from '@/lib/form-errors';
import { useRenamePlate } from '../api/rename-plate';

type Values = z.input<typeof plateRenameSchema>;

export type RenamePlateDialogProps = {
  /** The plate to rename; null keeps the dialog closed. */
  plate: PlateSummary | null;
  onClose: () => void;
  onRenamed: (name: string) => void;
};

export function RenamePlateDialog({ plate, onClose, onRenamed }: RenamePlateDialogProps) {
  return plate ? <RenameForm key={plate.id} plate={plate} onClose={onClose} onRenamed={onRenamed} /> : null;
}

function RenameForm({ plate, onClose, onRenamed }: RenamePlateDialogProps & { plate: PlateSummary }) {
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<Values, unknown, z.output<typeof plateRenameSchema>>({
    resolver: zodResolver(plateRenameSchema),
    defaultValues: { name: plate.name },
  });
  const rename = useRenamePlate({ onSuccess: ({ name }) => onRenamed(name) });
  const onSubmit = form.handleSubmit(({ name }) => {
    setFormError(null);
    if (name === plate.name) return onClose();
    rename.mutate(
      { plateId: plate.id, name },
      { onError: (error) => setFormError(applyServerErrors(error, form.setError, ['name'])) },
    );
  });
  return (
    <Dialog
      open
      onClose={onClose}
      title={`Rename ${plate.name}`}
      footer={
        <>
          <Button onClick={onClose}>Cancel</Button>
          <Button type="submit" form="rename-plate-form" variant="primary" busy={rename.isPending}>
            Rename
          </Button>
        </>
      }
    >
      <form id="rename-plate-form" onSubmit={onSubmit} noValidate className="space-y-3">
        {formError && <Notice tone="error">{formError}</Notice>}
        <TextField
          label="Plate name"
          autoFocus
          error={form.formState.errors.name?.message}
          {...form.register('name')}
        />
      </form>
    </Dialog>
  );
}
