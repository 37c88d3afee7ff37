import { createColumnHelper } from '@tanstack/react-table';
import { useMemo } from 'react';
import { roleLabels } from '@shared/permissions';
import type { TeamSummary } from '@shared/schemas/api-types';
import { Button } from '@/components/ui/button';
import { DataTable } from '@/components/ui/data-table';

type Member = TeamSummary['members'][number];
const column = createColumnHelper<Member>();

export type MembersTableProps = {
  team: TeamSummary;
  /** Given only to those who may manage members (admins). */
  onRemove?: (member: Member) => void;
};

export function MembersTable({ team, onRemove }: MembersTableProps) {
  const columns = useMemo(
    () => [
      column.accessor('name', {
        header: 'Name',
        cell: (c) => <span className="font-semibold">{c.getValue()}</span>,
      }),
      column.accessor('email', { header: 'E-mail' }),
      column.accessor((m) => roleLabels[m.role], { id: 'role', header: 'Role' }),
      ...(onRemove
        ? [
            column.display({
              id: 'actions',
              header: () => <span className="sr-only">Actions</span>,
              meta: { className: 'text-right' },
              cell: ({ row }) => (
                <Button size="sm" onClick={() => onRemove(row.original)}>
                  Remove
                  <span className="sr-only">
                    {' '}
                    {row.original.name} from {team.name}
                  </span>
                </Button>
              ),
            }),
          ]
        : []),
    ],
    [onRemove, team.name],
  );
  return (
    <DataTable
      data={team.members}
      columns={columns}
      label={`Members of ${team.name}`}
      getRowId={(m) => m.id}
      initialSorting={[{ id: 'name', desc: false }]}
      empty="No members yet."
    />
  );
}
