// One team: what it is, its members and, for admins, adding and removing members.
import { useState, type ReactNode } from 'react';
import type { TeamSummary } from '@shared/schemas/api-types';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { useToast } from '@/components/ui/toast';
import { formatDate } from '@/lib/format';
import { useRemoveMember } from '../api/remove-member';
import { AddMemberForm, type Candidate } from './add-member-form';
import { MembersTable } from './members-table';

type Member = TeamSummary['members'][number];

export type TeamPanelProps = {
  team: TeamSummary;
  /** Admins: people who may be added (active accounts); undefined hides member management. */
  candidates?: Candidate[];
  /** Buttons for the team's header, e.g. the invitation button. */
  actions?: ReactNode;
  onMembersChanged?: () => void;
};

export function TeamPanel({ team, candidates, actions, onMembersChanged }: TeamPanelProps) {
  const toast = useToast();
  const [removing, setRemoving] = useState<Member | null>(null);
  const remove = useRemoveMember();
  const manage = candidates !== undefined;
  const memberIds = new Set(team.members.map((m) => m.id));

  const confirmRemove = () => {
    if (!removing) return;
    remove.mutate(
      { teamId: team.id, userId: removing.id },
      {
        onSuccess: () => {
          toast.show(`${removing.name} is no longer a member of ${team.name}.`);
          setRemoving(null);
          onMembersChanged?.();
        },
      },
    );
  };

  return (
    <section aria-labelledby={`team-${team.id}`} className="rounded-md border border-line bg-surface p-5">
      <div className="mb-4 flex items-start justify-between gap-4">
        <div>
          <h2 id={`team-${team.id}`} className="text-xl">
            {team.name}
          </h2>
          {team.description && <p className="mt-1 max-w-2xl text-ink-muted">{team.description}</p>}
          <p className="mt-1 text-sm text-ink-faint">
            {team.members.length} {team.members.length === 1 ? 'member' : 'members'} · created{' '}
            {formatDate(team.createdAt)}
          </p>
        </div>
        {actions && <div className="no-print flex gap-2">{actions}</div>}
      </div>
      <MembersTable team={team} onRemove={manage ? setRemoving : undefined} />
      {manage && (
        <div className="no-print mt-4">
          <AddMemberForm
            teamId={team.id}
            teamName={team.name}
            candidates={candidates.filter((c) => !memberIds.has(c.id))}
            onAdded={(c) => {
              toast.show(`${c.name} was added to ${team.name}.`);
              onMembersChanged?.();
            }}
          />
        </div>
      )}
      <ConfirmDialog
        open={removing !== null}
        title={`Remove ${removing?.name ?? ''} from ${team.name}?`}
        confirmLabel="Remove"
        busy={remove.isPending}
        error={remove.error?.message}
        onConfirm={confirmRemove}
        onCancel={() => {
          remove.reset();
          setRemoving(null);
        }}
      >
        <p>
          They no longer see the team&rsquo;s work. Records they made stay with the team. You can add them
          again later.
        </p>
      </ConfirmDialog>
    </section>
  );
}
