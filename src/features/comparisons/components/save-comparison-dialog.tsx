// Save the comparison under a name, with notes; or, for a saved one, save the changes with the
// version it was opened at. Someone else's change in between gets 409 and an offer to reload.
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { optionalText, text } from '@shared/schemas/common';
import type { ComparisonInput, SavedComparison } from '@shared/schemas/comparisons';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { TextAreaField, TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { ApiError } from '@/lib/api-client';
import { applyServerErrors } from '@/lib/form-errors';
import { useSaveComparison } from '../api/save-comparison';
import { useUpdateComparison } from '../api/update-comparison';

// The same rules as comparisonSaveSchema's name and notes (shared/schemas/comparisons.ts).
const formSchema = z.object({ name: text(120, 'Name'), notes: optionalText(4000, 'Notes') });
type Values = z.input<typeof formSchema>;

export type SaveComparisonDialogProps = {
  open: boolean;
  onClose: () => void;
  input: ComparisonInput;
  /** Editing a saved comparison: its id, version, name and notes. */
  saved?: Pick<SavedComparison, 'id' | 'version' | 'name' | 'notes'>;
  onSaved: (saved: SavedComparison) => void;
  /** Offered when the saved comparison changed meanwhile (409). */
  onReload?: () => void;
};

export function SaveComparisonDialog({
  open,
  onClose,
  input,
  saved,
  onSaved,
  onReload,
}: SaveComparisonDialogProps) {
  const [formError, setFormError] = useState<string | null>(null);
  const [stale, setStale] = useState(false);
  const form = useForm<Values>({
    resolver: zodResolver(formSchema),
    defaultValues: { name: saved?.name ?? '', notes: saved?.notes ?? '' },
  });
  const { errors } = form.formState;
  const create = useSaveComparison({ onSuccess: onSaved });
  const update = useUpdateComparison({ onSuccess: onSaved });
  const pending = create.isPending || update.isPending;
  const onError = (error: Error) => {
    if (error instanceof ApiError && error.status === 409) {
      setStale(true);
      return;
    }
    setFormError(applyServerErrors(error, form.setError, ['name', 'notes']));
  };
  const onSubmit = form.handleSubmit((v) => {
    setFormError(null);
    setStale(false);
    const body = { ...input, name: v.name.trim(), notes: (v.notes ?? '').trim() };
    if (saved) update.mutate({ id: saved.id, change: { ...body, version: saved.version } }, { onError });
    else create.mutate(body, { onError });
  });
  return (
    <Dialog
      open={open}
      onClose={onClose}
      title={saved ? 'Save changes to the comparison' : 'Save comparison'}
      description="Saved comparisons are listed for your team; anyone in it can open the link."
      footer={
        <>
          <Button onClick={onClose}>Cancel</Button>
          <Button type="submit" form="save-comparison-form" variant="primary" busy={pending}>
            {saved ? 'Save changes' : 'Save comparison'}
          </Button>
        </>
      }
    >
      <form id="save-comparison-form" onSubmit={onSubmit} noValidate className="space-y-4">
        {formError && <Notice tone="error">{formError}</Notice>}
        {stale && (
          <Notice tone="warning" title="Changed by someone else">
            <p>
              This comparison was changed since you opened it. Reload it to see the saved version (your
              changes here are lost).
            </p>
            {onReload && (
              <Button size="sm" className="mt-2" onClick={onReload}>
                Reload the saved comparison
              </Button>
            )}
          </Notice>
        )}
        <TextField label="Name" autoFocus error={errors.name?.message} {...form.register('name')} />
        <TextAreaField
          label="Notes"
          rows={4}
          hint="What the comparison is for, what it shows."
          error={errors.notes?.message}
          {...form.register('notes')}
        />
      </form>
    </Dialog>
  );
}
