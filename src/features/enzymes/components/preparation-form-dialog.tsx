// Add or edit a preparation of a variant: lot, protein concentration (mg/mL), date, storage buffer.
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { preparationCreateSchema } from '@shared/schemas/enzymes';
import type { Preparation } from '@shared/schemas/records-types';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { TextAreaField, TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { applyServerErrors } from '@/lib/form-errors';
import { useCreatePreparation } from '../api/create-preparation';
import { useUpdatePreparation } from '../api/update-preparation';

type Values = z.input<typeof preparationCreateSchema>;
type Output = z.output<typeof preparationCreateSchema>;

export type PreparationFormDialogProps = {
  open: boolean;
  onClose: () => void;
  variantId: string;
  variantName: string;
  preparation?: Preparation;
};

const fieldNames = ['lot', 'proteinMgPerMl', 'preparedOn', 'storageBuffer', 'notes'] as const;

const today = () => new Date().toISOString().slice(0, 10);

export function PreparationFormDialog(props: PreparationFormDialogProps) {
  const { open, onClose, variantId, variantName, preparation } = props;
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<Values, unknown, Output>({
    resolver: zodResolver(preparationCreateSchema),
    values: {
      lot: preparation?.lot ?? '',
      proteinMgPerMl: preparation?.proteinMgPerMl ?? Number.NaN,
      preparedOn: preparation?.preparedOn ?? today(),
      storageBuffer: preparation?.storageBuffer ?? '',
      notes: preparation?.notes ?? '',
    },
  });
  const { errors } = form.formState;
  const close = () => {
    form.reset();
    setFormError(null);
    onClose();
  };
  const create = useCreatePreparation({ onSuccess: close });
  const update = useUpdatePreparation({ onSuccess: close });
  const onError = (error: unknown) => setFormError(applyServerErrors(error, form.setError, fieldNames));
  const onSubmit = form.handleSubmit((input) => {
    setFormError(null);
    if (preparation) update.mutate({ id: preparation.id, change: input }, { onError });
    else create.mutate({ variantId, input }, { onError });
  });
  return (
    <Dialog
      open={open}
      onClose={close}
      title={preparation ? `Edit preparation ${preparation.lot}` : `New preparation of ${variantName}`}
      footer={
        <>
          <Button onClick={close}>Cancel</Button>
          <Button
            type="submit"
            form="preparation-form"
            variant="primary"
            busy={create.isPending || update.isPending}
          >
            {preparation ? 'Save changes' : 'Add preparation'}
          </Button>
        </>
      }
    >
      <form id="preparation-form" onSubmit={onSubmit} noValidate className="grid grid-cols-2 gap-4">
        {formError && (
          <Notice tone="error" className="col-span-2">
            {formError}
          </Notice>
        )}
        <TextField label="Lot" autoFocus error={errors.lot?.message} {...form.register('lot')} />
        <TextField
          label="Protein (mg/mL)"
          type="number"
          step="any"
          inputMode="decimal"
          className="[&_input]:text-right"
          error={errors.proteinMgPerMl?.message}
          {...form.register('proteinMgPerMl', { valueAsNumber: true })}
        />
        <TextField
          label="Prepared on"
          type="date"
          error={errors.preparedOn?.message}
          {...form.register('preparedOn')}
        />
        <TextField
          label="Storage buffer"
          placeholder="20 mM Tris pH 7.5, 100 mM NaCl"
          hint="Optional."
          error={errors.storageBuffer?.message}
          {...form.register('storageBuffer')}
        />
        <TextAreaField
          label="Notes"
          hint="Optional."
          className="col-span-2"
          error={errors.notes?.message}
          {...form.register('notes')}
        />
      </form>
    </Dialog>
  );
}
