// New enzyme (team, name, source organism, notes) or an edit of one (the team stays).
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import type { TeamRef } from '@shared/schemas/api-types';
import { enzymeCreateSchema } from '@shared/schemas/enzymes';
import type { Enzyme } from '@shared/schemas/records-types';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { SelectField, TextAreaField, TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { applyServerErrors } from '@/lib/form-errors';
import { useCreateEnzyme } from '../api/create-enzyme';
import { useUpdateEnzyme } from '../api/update-enzyme';

type Values = z.input<typeof enzymeCreateSchema>;
type Output = z.output<typeof enzymeCreateSchema>;

export type EnzymeFormDialogProps = {
  open: boolean;
  onClose: () => void;
  teams: TeamRef[];
  /** Editing this enzyme; omit to create one. */
  enzyme?: Enzyme & { teamName?: string };
  onSaved?: (enzyme: Enzyme) => void;
};

const fieldNames = ['teamId', 'name', 'organism', 'notes'] as const;

export function EnzymeFormDialog({ open, onClose, teams, enzyme, onSaved }: EnzymeFormDialogProps) {
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<Values, unknown, Output>({
    resolver: zodResolver(enzymeCreateSchema),
    values: {
      teamId: enzyme?.teamId ?? (teams.length === 1 ? teams[0].id : ''),
      name: enzyme?.name ?? '',
      organism: enzyme?.organism ?? '',
      notes: enzyme?.notes ?? '',
    },
  });
  const { errors } = form.formState;
  const close = () => {
    form.reset();
    setFormError(null);
    onClose();
  };
  const done = (saved: Enzyme) => {
    close();
    onSaved?.(saved);
  };
  const create = useCreateEnzyme({ onSuccess: done });
  const update = useUpdateEnzyme({ onSuccess: done });
  const onError = (error: unknown) => setFormError(applyServerErrors(error, form.setError, fieldNames));
  const onSubmit = form.handleSubmit((input) => {
    setFormError(null);
    if (enzyme) {
      const { teamId: _team, ...change } = input;
      update.mutate({ id: enzyme.id, change }, { onError });
    } else {
      create.mutate(input, { onError });
    }
  });
  const title = enzyme ? `Edit ${enzyme.name}` : 'New enzyme';
  return (
    <Dialog
      open={open}
      onClose={close}
      title={title}
      description={enzyme ? undefined : 'The parent and its variants are added on the enzyme’s page.'}
      footer={
        <>
          <Button onClick={close}>Cancel</Button>
          <Button
            type="submit"
            form="enzyme-form"
            variant="primary"
            busy={create.isPending || update.isPending}
          >
            {enzyme ? 'Save changes' : 'Create enzyme'}
          </Button>
        </>
      }
    >
      <form id="enzyme-form" onSubmit={onSubmit} noValidate className="space-y-4">
        {formError && <Notice tone="error">{formError}</Notice>}
        {enzyme ? (
          <p>
            <span className="font-semibold">Team:</span>{' '}
            {enzyme.teamName ?? teams.find((t) => t.id === enzyme.teamId)?.name ?? '—'}{' '}
            <span className="text-ink-muted">(an enzyme stays in its team)</span>
          </p>
        ) : (
          <SelectField
            label="Team"
            hint="Only members of this team will see it."
            error={errors.teamId?.message}
            {...form.register('teamId')}
          >
            <option value="">Choose a team…</option>
            {teams.map((t) => (
              <option key={t.id} value={t.id}>
                {t.name}
              </option>
            ))}
          </SelectField>
        )}
        <TextField label="Name" autoFocus error={errors.name?.message} {...form.register('name')} />
        <TextField
          label="Source organism"
          hint="Optional."
          error={errors.organism?.message}
          {...form.register('organism')}
        />
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
