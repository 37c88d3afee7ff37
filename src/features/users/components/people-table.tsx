// All accounts: change a role or deactivate/reactivate, each after a confirmation that says what
// follows. The server refuses to remove the last active admin and says so.
import { useMemo, useState, type ReactNode } from 'react';
import { roleLabels, roles, type Role } from '@shared/permissions';
import type { UserSummary } from '@shared/schemas/api-types';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { DataTable } from '@/components/ui/data-table';
import { useToast } from '@/components/ui/toast';
import { useUpdateUser, type UserChange } from '../api/update-user';
import { peopleColumns } from './people-columns';

type Pending = { user: UserSummary; change: UserChange };

export type PeopleTableProps = {
  users: UserSummary[];
  currentUserId: string;
  /** Called after a change is saved (the page refreshes what depends on it). */
  onChanged?: (userId: string) => void;
  toolbar?: ReactNode;
};

function describe({ user, change }: Pending, self: boolean) {
  if (change.role) {
    const to = roleLabels[change.role];
    return {
      title: self ? 'Change your own role?' : `Change the role of ${user.name}?`,
      body: `${roleLabels[user.role]} → ${to}. The server applies the new role from ${self ? 'your' : 'their'} next request${self ? '; pages your new role cannot open disappear from your menu' : ''}.`,
      confirm: `Make ${to.toLowerCase()}`,
      done: `${user.name} is now ${to.toLowerCase()}.`,
    };
  }
  if (change.active) {
    return {
      title: `Reactivate ${user.name}?`,
      body: `${user.name} can sign in again with their existing password.`,
      confirm: 'Reactivate',
      done: `${user.name} was reactivated.`,
    };
  }
  return {
    title: self ? 'Deactivate your own account?' : `Deactivate ${user.name}?`,
    body: self
      ? 'You can no longer sign in, and every open session of your account ends now, this one included. Another admin can reactivate it.'
      : `${user.name} can no longer sign in, and every open session of theirs ends now. Their records stay, and you can reactivate the account later.`,
    confirm: 'Deactivate',
    done: `${user.name} was deactivated; their open sessions ended.`,
  };
}

export function PeopleTable({ users, currentUserId, onChanged, toolbar }: PeopleTableProps) {
  const toast = useToast();
  const [pending, setPending] = useState<Pending | null>(null);
  const update = useUpdateUser();
  const columns = useMemo(
    () =>
      peopleColumns({
        onRoleChange: (user, role: Role) => role !== user.role && setPending({ user, change: { role } }),
        onActiveChange: (user, active) => setPending({ user, change: { active } }),
      }),
    [],
  );
  const text = pending ? describe(pending, pending.user.id === currentUserId) : null;
  const cancel = () => {
    update.reset();
    setPending(null);
  };
  const confirm = () => {
    if (!pending || !text) return;
    update.mutate(
      { id: pending.user.id, change: pending.change },
      {
        onSuccess: () => {
          toast.show(text.done);
          onChanged?.(pending.user.id);
          setPending(null);
        },
      },
    );
  };

  return (
    <>
      <DataTable
        data={users}
        columns={columns}
        label="People"
        getRowId={(u) => u.id}
        search={{ label: 'Search', placeholder: 'Name, e-mail or team' }}
        filters={[
          {
            columnId: 'role',
            label: 'Role',
            options: roles.map((r) => ({ value: r, label: roleLabels[r] })),
          },
          {
            columnId: 'status',
            label: 'Status',
            options: [
              { value: 'active', label: 'Active' },
              { value: 'deactivated', label: 'Deactivated' },
            ],
          },
        ]}
        initialSorting={[{ id: 'name', desc: false }]}
        empty="No accounts yet."
        toolbar={toolbar}
      />
      <ConfirmDialog
        open={pending !== null}
        title={text?.title ?? ''}
        confirmLabel={text?.confirm ?? 'Confirm'}
        busy={update.isPending}
        error={update.error?.message}
        onConfirm={confirm}
        onCancel={cancel}
      >
        <p>{text?.body}</p>
      </ConfirmDialog>
    </>
  );
}
