import { createColumnHelper } from '@tanstack/react-table';
import { roleLabels, roles, type Role } from '@shared/permissions';
import type { UserSummary } from '@shared/schemas/api-types';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { formatDateTime, listOf } from '@/lib/format';

export type PeopleActions = {
  onRoleChange: (user: UserSummary, role: Role) => void;
  onActiveChange: (user: UserSummary, active: boolean) => void;
};

const column = createColumnHelper<UserSummary>();

export function peopleColumns({ onRoleChange, onActiveChange }: PeopleActions) {
  return [
    column.accessor('name', {
      header: 'Name',
      cell: (c) => <span className="font-semibold">{c.getValue()}</span>,
    }),
    column.accessor('email', { header: 'E-mail' }),
    column.accessor('role', {
      header: 'Role',
      cell: ({ row }) => (
        <select
          aria-label={`Role of ${row.original.name}`}
          value={row.original.role}
          onChange={(e) => onRoleChange(row.original, e.target.value as Role)}
          className="h-7 rounded border border-line-strong bg-surface px-1.5"
        >
          {roles.map((r) => (
            <option key={r} value={r}>
              {roleLabels[r]}
            </option>
          ))}
        </select>
      ),
    }),
    column.accessor((u) => listOf(u.teams.map((t) => t.name)), { id: 'teams', header: 'Teams' }),
    column.accessor((u) => (u.active ? 'active' : 'deactivated'), {
      id: 'status',
      header: 'Status',
      cell: ({ row }) =>
        row.original.active ? <Badge tone="accent">Active</Badge> : <Badge tone="neutral">Deactivated</Badge>,
    }),
    column.accessor((u) => u.lastSignInAt ?? undefined, {
      id: 'lastSignInAt',
      header: 'Last sign-in',
      meta: { numeric: true },
      sortUndefined: 'last',
      cell: (c) => formatDateTime(c.getValue(), 'never'),
    }),
    column.display({
      id: 'actions',
      header: () => <span className="sr-only">Actions</span>,
      meta: { className: 'text-right' },
      cell: ({ row }) => (
        <Button size="sm" onClick={() => onActiveChange(row.original, !row.original.active)}>
          {row.original.active ? 'Deactivate' : 'Reactivate'}
          <span className="sr-only"> {row.original.name}</span>
        </Button>
      ),
    }),
  ];
}
