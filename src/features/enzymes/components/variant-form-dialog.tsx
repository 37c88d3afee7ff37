// Add or edit a variant: name, mutation list in one-letter notation (checked by the shared schema,
// so "D92" or "D92D" is refused on the field before anything is sent), parent flag, notes.
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { variantCreateSchema } from '@shared/schemas/enzymes';
import type { Variant } from '@shared/schemas/records-types';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { TextAreaField, TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { applyServerErrors } from '@/lib/form-errors';
import { useCreateVariant } from '../api/create-variant';
import { useUpdateVariant } from '../api/update-variant';

type Values = z.input<typeof variantCreateSchema>;
type Output = z.output<typeof variantCreateSchema>;

export type VariantFormDialogProps = {
  open: boolean;
  onClose: () => void;
  enzymeId: string;
  enzymeName: string;
  /** Editing this variant; omit to add one. */
  variant?: Variant;
  /** Whether another variant is the parent already (the server allows one). */
  parentTaken: boolean;
  onSaved?: (variant: Variant) => void;
};

const fieldNames = ['name', 'mutations', 'isParent', 'notes'] as const;

export function VariantFormDialog(props: VariantFormDialogProps) {
  const { open, onClose, enzymeId, enzymeName, variant, parentTaken, onSaved } = props;
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<Values, unknown, Output>({
    resolver: zodResolver(variantCreateSchema),
    values: {
      name: variant?.name ?? '',
      mutations: variant?.mutations ?? '',
      isParent: variant?.isParent ?? false,
      notes: variant?.notes ?? '',
    },
  });
  const { errors } = form.formState;
  const close = () => {
    form.reset();
    setFormError(null);
    onClose();
  };
  const done = (saved: Variant) => {
    close();
    onSaved?.(saved);
  };
  const create = useCreateVariant({ onSuccess: done });
  const update = useUpdateVariant({ onSuccess: done });
  const onError = (error: unknown) => setFormError(applyServerErrors(error, form.setError, fieldNames));
  const onSubmit = form.handleSubmit((input) => {
    setFormError(null);
    if (variant) update.mutate({ id: variant.id, change: input }, { onError });
    else create.mutate({ enzymeId, input }, { onError });
  });
  const parentLocked = parentTaken && !variant?.isParent;
  return (
    <Dialog
      open={open}
      onClose={close}
      title={variant ? `Edit ${variant.name}` : `New variant of ${enzymeName}`}
      footer={
        <>
          <Button onClick={close}>Cancel</Button>
          <Button
            type="submit"
            form="variant-form"
            variant="primary"
            busy={create.isPending || update.isPending}
          >
            {variant ? 'Save changes' : 'Add variant'}
          </Button>
        </>
      }
    >
      <form id="variant-form" onSubmit={onSubmit} noValidate className="space-y-4">
        {formError && <Notice tone="error">{formError}</Notice>}
        <TextField label="Variant name" autoFocus error={errors.name?.message} {...form.register('name')} />
        <TextField
          label="Mutations"
          placeholder="D92N/S110A"
          className="[&_input]:font-mono"
          hint="One-letter notation: wild-type residue, position, new residue; separate with “/”. Empty for the parent."
          error={errors.mutations?.message}
          {...form.register('mutations')}
        />
        <label className="flex items-start gap-2">
          <input
            type="checkbox"
            className="mt-1 size-4 accent-accent-700"
            disabled={parentLocked}
            {...form.register('isParent')}
          />
          <span>
            <span className="font-semibold">Parent (wild type)</span>
            <span className="block text-sm text-ink-muted">
              {parentLocked
                ? 'Another variant is the parent already; an enzyme has one.'
                : 'The reference other variants are compared with.'}
            </span>
          </span>
        </label>
        <TextAreaField
          label="Notes"
          hint="Optional."
          error={errors.notes?.message}
          {...form.register('notes')}
        />
      </form>
    </Dialog>
  );
}
