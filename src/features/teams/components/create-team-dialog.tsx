import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { teamCreateSchema } from '@shared/schemas/teams';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { TextAreaField, TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { applyServerErrors } from '@/lib/form-errors';
import { useCreateTeam, type TeamCreated } from '../api/create-team';

type Values = z.input<typeof teamCreateSchema>;

export type CreateTeamDialogProps = {
  open: boolean;
  onClose: () => void;
  onCreated?: (team: TeamCreated) => void;
};

export function CreateTeamDialog({ open, onClose, onCreated }: CreateTeamDialogProps) {
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<Values, unknown, z.output<typeof teamCreateSchema>>({
    resolver: zodResolver(teamCreateSchema),
    defaultValues: { name: '', description: '' },
  });
  const { errors } = form.formState;
  const close = () => {
    form.reset();
    setFormError(null);
    onClose();
  };
  const create = useCreateTeam({
    onSuccess: (team) => {
      close();
      onCreated?.(team);
    },
  });
  const onSubmit = form.handleSubmit((input) => {
    setFormError(null);
    create.mutate(input, {
      onError: (error) => setFormError(applyServerErrors(error, form.setError, ['name', 'description'])),
    });
  });
  return (
    <Dialog
      open={open}
      onClose={close}
      title="New team"
      description="Work in Bellwether belongs to a team: only its members (and admins) see it."
      footer={
        <>
          <Button onClick={close}>Cancel</Button>
          <Button type="submit" form="create-team-form" variant="primary" busy={create.isPending}>
            Create team
          </Button>
        </>
      }
    >
      <form id="create-team-form" onSubmit={onSubmit} noValidate className="space-y-4">
        {formError && <Notice tone="error">{formError}</Notice>}
        <TextField label="Team name" autoFocus error={errors.name?.message} {...form.register('name')} />
        <TextAreaField
          label="Description"
          hint="Optional. What the team works on."
          error={errors.description?.message}
          {...form.register('description')}
        />
      </form>
    </Dialog>
  );
}
