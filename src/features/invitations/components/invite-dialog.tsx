// Invite someone by e-mail: an admin may give any role and any team (or none); a lead invites
// leads, scientists and viewers into one of their own teams. The server checks the same rules.
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { roleLabels, type Role } from '@shared/permissions';
import type { TeamRef } from '@shared/schemas/api-types';
import { invitationCreateSchema } from '@shared/schemas/auth';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { SelectField, TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { applyServerErrors } from '@/lib/form-errors';
import { useCreateInvitation, type InvitationCreated } from '../api/create-invitation';

type Values = z.input<typeof invitationCreateSchema>;

export type InviteDialogProps = {
  open: boolean;
  onClose: () => void;
  roles: readonly Role[];
  teams: readonly TeamRef[];
  /** Admins may invite without a team; leads must pick one of theirs. */
  teamRequired: boolean;
  defaultTeamId?: string | null;
  onInvited?: (result: InvitationCreated) => void;
};

export function InviteDialog({
  open,
  onClose,
  roles,
  teams,
  teamRequired,
  defaultTeamId,
  onInvited,
}: InviteDialogProps) {
  const [formError, setFormError] = useState<string | null>(null);
  const initialTeam = defaultTeamId ?? (teamRequired ? (teams[0]?.id ?? null) : null);
  const form = useForm<Values, unknown, z.output<typeof invitationCreateSchema>>({
    resolver: zodResolver(invitationCreateSchema),
    defaultValues: {
      email: '',
      role: roles.includes('scientist') ? 'scientist' : roles[0],
      teamId: initialTeam,
    },
  });
  const { errors } = form.formState;
  const close = () => {
    form.reset();
    setFormError(null);
    onClose();
  };
  const invite = useCreateInvitation({
    onSuccess: (result) => {
      close();
      onInvited?.(result);
    },
  });
  const onSubmit = form.handleSubmit((input) => {
    setFormError(null);
    invite.mutate(input, {
      onError: (error) => setFormError(applyServerErrors(error, form.setError, ['email', 'role', 'teamId'])),
    });
  });

  return (
    <Dialog
      open={open}
      onClose={close}
      title="Invite someone"
      description="They get an e-mail with a link to choose their name and password. The link works once, for 72 hours."
      footer={
        <>
          <Button onClick={close}>Cancel</Button>
          <Button type="submit" form="invite-form" variant="primary" busy={invite.isPending}>
            Send invitation
          </Button>
        </>
      }
    >
      <form id="invite-form" onSubmit={onSubmit} noValidate className="space-y-4">
        {formError && <Notice tone="error">{formError}</Notice>}
        <TextField
          label="E-mail"
          type="email"
          autoComplete="off"
          autoFocus
          error={errors.email?.message}
          {...form.register('email')}
        />
        <SelectField label="Role" error={errors.role?.message} {...form.register('role')}>
          {roles.map((role) => (
            <option key={role} value={role}>
              {roleLabels[role]}
            </option>
          ))}
        </SelectField>
        <SelectField
          label="Team"
          error={errors.teamId?.message}
          hint={teamRequired ? 'One of your teams.' : 'Optional; members can be added to teams later.'}
          {...form.register('teamId', { setValueAs: (v: string | null) => (v ? v : null) })}
        >
          {!teamRequired && <option value="">No team</option>}
          {teams.map((team) => (
            <option key={team.id} value={team.id}>
              {team.name}
            </option>
          ))}
        </SelectField>
      </form>
    </Dialog>
  );
}
