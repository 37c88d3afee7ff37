// A new plate: name and format, starting empty, from a team template, or from another plate's map.
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { plateCreateSchema } from '@shared/schemas/plates';
import type { PlateSummary } from '@shared/schemas/plates-types';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { SelectField, TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { applyServerErrors } from '@/lib/form-errors';
import { useCreatePlate } from '../api/create-plate';
import { useTemplates } from '../api/get-templates';

type Values = z.input<typeof plateCreateSchema>;
type Start = 'empty' | 'template' | 'plate';

export type NewPlateDialogProps = {
  open: boolean;
  onClose: () => void;
  studyId: string;
  teamId: string;
  plates: PlateSummary[];
  onCreated: (plate: PlateSummary) => void;
};

export function NewPlateDialog({ open, onClose, studyId, teamId, plates, onCreated }: NewPlateDialogProps) {
  const [start, setStart] = useState<Start>('empty');
  const [sourceId, setSourceId] = useState('');
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<Values, unknown, z.output<typeof plateCreateSchema>>({
    resolver: zodResolver(plateCreateSchema),
    defaultValues: {
      name: `Plate ${plates.length + 1}`,
      format: 96,
      templateId: null,
      copyFromPlateId: null,
    },
  });
  // Radios give text; the schema wants the number, so the format is set by hand.
  const format = form.watch('format') === 384 ? 384 : 96;
  const templates = useTemplates(teamId, format, { enabled: open && start === 'template' });
  const sources = plates.filter((p) => p.format === format);
  const { errors } = form.formState;
  const close = () => {
    form.reset({ name: `Plate ${plates.length + 1}`, format: 96, templateId: null, copyFromPlateId: null });
    setStart('empty');
    setSourceId('');
    setFormError(null);
    onClose();
  };
  const create = useCreatePlate(studyId, {
    onSuccess: (plate) => {
      close();
      onCreated(plate);
    },
  });
  const onSubmit = form.handleSubmit((values) => {
    setFormError(null);
    const input = {
      ...values,
      templateId: start === 'template' ? sourceId || null : null,
      copyFromPlateId: start === 'plate' ? sourceId || null : null,
    };
    if (start === 'template' && !input.templateId) return setFormError('Choose a template, or start empty.');
    if (start === 'plate' && !input.copyFromPlateId)
      return setFormError('Choose a plate to copy, or start empty.');
    create.mutate(input, {
      onError: (error) => setFormError(applyServerErrors(error, form.setError, ['name', 'format'])),
    });
  });
  const radio = (value: Start, label: string, disabled = false) => (
    <label className={disabled ? 'text-ink-faint' : ''}>
      <input
        type="radio"
        name="start"
        checked={start === value}
        disabled={disabled}
        onChange={() => (setStart(value), setSourceId(''))}
      />{' '}
      {label}
    </label>
  );
  return (
    <Dialog
      open={open}
      onClose={close}
      title="New plate"
      footer={
        <>
          <Button onClick={close}>Cancel</Button>
          <Button type="submit" form="new-plate-form" variant="primary" busy={create.isPending}>
            Create plate
          </Button>
        </>
      }
    >
      <form id="new-plate-form" onSubmit={onSubmit} noValidate className="space-y-4">
        {formError && <Notice tone="error">{formError}</Notice>}
        <TextField label="Plate name" autoFocus error={errors.name?.message} {...form.register('name')} />
        <fieldset>
          <legend className="mb-1 font-semibold">Format</legend>
          <label className="mr-4">
            <input
              type="radio"
              name="format"
              checked={format === 96}
              onChange={() => form.setValue('format', 96)}
            />{' '}
            96 wells (8 × 12)
          </label>
          <label>
            <input
              type="radio"
              name="format"
              checked={format === 384}
              onChange={() => form.setValue('format', 384)}
            />{' '}
            384 wells (16 × 24)
          </label>
          {errors.format && <p className="mt-1 text-sm text-danger-600">{errors.format.message}</p>}
        </fieldset>
        <fieldset className="space-y-1">
          <legend className="mb-1 font-semibold">Start</legend>
          <div className="flex flex-col gap-1">
            {radio('empty', 'Empty')}
            {radio('template', 'From a team template')}
            {radio('plate', 'As a copy of another plate of this study', sources.length === 0)}
          </div>
        </fieldset>
        {start === 'template' && (
          <SelectField label="Template" value={sourceId} onChange={(e) => setSourceId(e.target.value)}>
            <option value="">
              {templates.isPending
                ? 'Loading…'
                : templates.data?.length
                  ? 'Choose…'
                  : `No ${format}-well templates yet`}
            </option>
            {templates.data?.map((t) => (
              <option key={t.id} value={t.id}>
                {t.name} ({Object.keys(t.map.wells).length} wells)
              </option>
            ))}
          </SelectField>
        )}
        {start === 'plate' && (
          <SelectField label="Plate to copy" value={sourceId} onChange={(e) => setSourceId(e.target.value)}>
            <option value="">Choose…</option>
            {sources.map((p) => (
              <option key={p.id} value={p.id}>
                {p.name}
              </option>
            ))}
          </SelectField>
        )}
      </form>
    </Dialog>
  );
}
