// A button that opens the invitation dialog and confirms the result in a toast.
import { useState } from 'react';
import type { Role } from '@shared/permissions';
import type { TeamRef } from '@shared/schemas/api-types';
import { Button } from '@/components/ui/button';
import { useToast } from '@/components/ui/toast';
import type { InvitationCreated } from '../api/create-invitation';
import { InviteDialog } from './invite-dialog';

export type InviteButtonProps = {
  roles: readonly Role[];
  teams: readonly TeamRef[];
  teamRequired: boolean;
  defaultTeamId?: string | null;
  label?: string;
};

export function InviteButton({ label = 'Invite someone', ...dialog }: InviteButtonProps) {
  const [open, setOpen] = useState(false);
  const toast = useToast();
  const onInvited = (result: InvitationCreated) =>
    result.mailSent
      ? toast.show(`Invitation sent to ${result.email}. The link works once, for 72 hours.`)
      : toast.show(
          `The invitation for ${result.email} was created, but the e-mail could not be sent. Check the mail settings and invite again.`,
          'warning',
        );
  return (
    <>
      <Button variant="primary" onClick={() => setOpen(true)}>
        {label}
      </Button>
      {open && <InviteDialog open={open} onClose={() => setOpen(false)} onInvited={onInvited} {...dialog} />}
    </>
  );
}
