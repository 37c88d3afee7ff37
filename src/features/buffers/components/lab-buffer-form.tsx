// "Add a lab buffer" (and edit one): builds the buffer-system JSON the API expects, validated by
// the shared schema before it is sent; the server validates it again and may refuse a clash.
import { useState } from 'react';
import { FormProvider, useFieldArray, useForm } from 'react-hook-form';
import type { BufferSystemInput } from '@shared/chemistry';
import type { BufferDetail } from '@shared/schemas/buffers-types';
import { Button } from '@/components/ui/button';
import { TextAreaField, TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { ApiError } from '@/lib/api-client';
import { useCreateBuffer } from '../api/create-buffer';
import { useUpdateBuffer } from '../api/update-buffer';
import {
  emptyForm,
  emptyIonization,
  emptyLabBuffer,
  fromSystem,
  labBufferResolver,
  slugOf,
  type LabBufferValues,
} from '../utils/lab-buffer-form';
import { errorAt, FormSection } from './lab-fields';
import { LabFormFields } from './lab-form-fields';
import { LabIonizationFields } from './lab-ionization-fields';

export type LabBufferFormProps = {
  /** Editing this lab system; omit to add one. */
  buffer?: BufferDetail;
  onSaved: (buffer: BufferDetail) => void;
  onCancel: () => void;
};

export function LabBufferForm({ buffer, onSaved, onCancel }: LabBufferFormProps) {
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<LabBufferValues, unknown, BufferSystemInput>({
    resolver: labBufferResolver,
    defaultValues: buffer ? fromSystem(buffer.system) : emptyLabBuffer(),
  });
  const { register, formState, setValue, getFieldState } = form;
  const ionizations = useFieldArray({ control: form.control, name: 'ionizations' });
  const forms = useFieldArray({ control: form.control, name: 'forms' });
  const create = useCreateBuffer({ onSuccess: onSaved });
  const update = useUpdateBuffer({ onSuccess: onSaved });
  const onError = (error: unknown) => {
    if (error instanceof ApiError && error.code === 'name_taken') {
      form.setError('id', { type: 'server', message: error.message });
      return;
    }
    setFormError(error instanceof Error ? error.message : 'Something went wrong.');
  };
  const onSubmit = form.handleSubmit(
    (system) => {
      setFormError(null);
      if (buffer) update.mutate({ id: buffer.id, system }, { onError });
      else create.mutate(system, { onError });
    },
    () => setFormError('Some values are not valid: see the fields marked in red.'),
  );
  const e = (name: string) => errorAt(formState.errors, name);

  return (
    <FormProvider {...form}>
      <form onSubmit={onSubmit} noValidate className="space-y-5" aria-label="Lab buffer">
        {formError && <Notice tone="error">{formError}</Notice>}
        <FormSection title="Buffer system">
          <div className="grid grid-cols-3 gap-3">
            <TextField
              label="Name"
              error={e('name')}
              {...register('name', {
                onChange: (event: { target: { value: string } }) => {
                  if (!buffer && !getFieldState('id').isDirty) setValue('id', slugOf(event.target.value));
                },
              })}
            />
            <TextField
              label="Id"
              readOnly={Boolean(buffer)}
              hint={
                buffer ? 'The id of a saved system does not change.' : 'Lower-case words joined by hyphens.'
              }
              error={e('id')}
              {...register('id')}
            />
            <TextField
              label="Aliases"
              hint="Optional, separated by commas."
              error={e('aliasesText')}
              {...register('aliasesText')}
            />
            <TextAreaField
              label="Cautions"
              hint="One per line; shown on recipes that use this buffer."
              rows={2}
              error={e('cautionsText')}
              {...register('cautionsText')}
            />
            <TextAreaField
              label="Notes"
              hint="One per line."
              rows={2}
              error={e('notesText')}
              {...register('notesText')}
            />
            <label className="flex items-start gap-2 self-center">
              <input
                type="checkbox"
                className="mt-1 size-4 accent-accent-700"
                {...register('designerDefault')}
              />
              <span>
                <span className="font-semibold">Offered by the series designer</span>
                <span className="block text-sm text-ink-muted">
                  Otherwise only when a series asks for it by name.
                </span>
              </span>
            </label>
          </div>
        </FormSection>
        {ionizations.fields.map((field, i) => (
          <FormSection
            key={field.id}
            title={`Ionization ${i + 1}`}
            actions={
              ionizations.fields.length > 1 && (
                <Button size="sm" variant="ghost" onClick={() => ionizations.remove(i)}>
                  Remove ionization {i + 1}
                </Button>
              )
            }
          >
            <LabIonizationFields index={i} />
          </FormSection>
        ))}
        {e('ionizations.root') && <p className="text-sm text-danger-600">{e('ionizations.root')}</p>}
        {ionizations.fields.length < 3 && (
          <Button size="sm" onClick={() => ionizations.append(emptyIonization())}>
            Add an ionization
          </Button>
        )}
        {forms.fields.map((field, i) => (
          <FormSection
            key={field.id}
            title={`Form ${i + 1}`}
            actions={
              forms.fields.length > 1 && (
                <Button size="sm" variant="ghost" onClick={() => forms.remove(i)}>
                  Remove form {i + 1}
                </Button>
              )
            }
          >
            <LabFormFields index={i} />
          </FormSection>
        ))}
        {e('forms.root') && <p className="text-sm text-danger-600">{e('forms.root')}</p>}
        {forms.fields.length < 20 && (
          <Button size="sm" onClick={() => forms.append(emptyForm())}>
            Add a form
          </Button>
        )}
        <div className="flex gap-2 border-t border-line pt-4">
          <Button type="submit" variant="primary" busy={create.isPending || update.isPending}>
            {buffer ? 'Save lab buffer' : 'Add lab buffer'}
          </Button>
          <Button onClick={onCancel}>Cancel</Button>
        </div>
      </form>
    </FormProvider>
  );
}
