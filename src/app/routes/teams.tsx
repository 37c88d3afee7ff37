// Teams: admins see and manage every team; leads see their teams and invite people into them;
// scientists and viewers see their teams read-only.
import { useQueryClient, type QueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { useNavigate, useParams } from 'react-router';
import { can } from '@shared/permissions';
import { Button } from '@/components/ui/button';
import { Notice, QueryError } from '@/components/ui/notice';
import { PageHeader } from '@/components/ui/page-header';
import { Loading } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { InviteButton } from '@/features/invitations/components/invite-button';
import { invitableRoles } from '@/features/invitations/utils/invitable-roles';
import { getTeamsQueryOptions, useTeams } from '@/features/teams/api/get-teams';
import { CreateTeamDialog } from '@/features/teams/components/create-team-dialog';
import { TeamList } from '@/features/teams/components/team-list';
import { TeamPanel } from '@/features/teams/components/team-panel';
import { userKeys } from '@/features/users/api/keys';
import { useUsers } from '@/features/users/api/get-users';
import { useUser, warmCacheFor } from '@/lib/auth';
import { meQueryKey } from '@/lib/query-client';

export const clientLoader = (queryClient: QueryClient) => () =>
  warmCacheFor(queryClient, 'teams:read', () => queryClient.ensureQueryData(getTeamsQueryOptions()));

const intro = {
  manage:
    'Work belongs to a team; only its members and admins see it. Create teams and choose their members here.',
  invite: 'The teams you belong to and their members. Invite colleagues into your teams.',
  read: 'The teams you belong to and their members.',
};

export default function TeamsRoute() {
  const { data: me } = useUser();
  const { teamId } = useParams();
  const navigate = useNavigate();
  const queryClient = useQueryClient();
  const [creating, setCreating] = useState(false);
  const manage = can(me?.role, 'teams:manage');
  const invite = can(me?.role, 'invitations:create');
  const teams = useTeams();
  const users = useUsers({ enabled: manage });

  if (!me) return null;
  const refreshPeople = () => {
    void queryClient.invalidateQueries({ queryKey: userKeys.all });
    void queryClient.invalidateQueries({ queryKey: meQueryKey });
  };
  const header = (
    <PageHeader
      title="Teams"
      description={manage ? intro.manage : invite ? intro.invite : intro.read}
      actions={
        manage && (
          <Button variant="primary" onClick={() => setCreating(true)}>
            New team
          </Button>
        )
      }
    />
  );
  const dialog = manage && (
    <CreateTeamDialog
      open={creating}
      onClose={() => setCreating(false)}
      onCreated={(t) => void navigate(paths.team.href(t.id))}
    />
  );

  if (teams.isPending)
    return (
      <>
        {header}
        <Loading label="Loading teams…" />
      </>
    );
  if (teams.isError)
    return (
      <>
        {header}
        <QueryError error={teams.error} what="the teams" onRetry={() => void teams.refetch()} />
      </>
    );
  if (teams.data.length === 0) {
    return (
      <>
        {header}
        <Notice title={manage ? 'No teams yet' : 'You are not in a team yet'}>
          {manage
            ? 'Create the first team with “New team”.'
            : 'An admin adds you to a team; then its members and work appear here.'}
        </Notice>
        {dialog}
      </>
    );
  }

  const selected = teamId ? teams.data.find((t) => t.id === teamId) : teams.data[0];
  const candidates = manage ? (users.data ?? []).filter((u) => u.active) : undefined;
  return (
    <>
      {header}
      <div className="grid grid-cols-[16rem_1fr] items-start gap-6">
        <TeamList teams={teams.data} selectedId={selected?.id ?? null} />
        {selected ? (
          <TeamPanel
            team={selected}
            candidates={candidates}
            onMembersChanged={refreshPeople}
            actions={
              invite && (
                <InviteButton
                  label="Invite into this team"
                  roles={invitableRoles(me.role)}
                  teams={teams.data}
                  teamRequired={!manage}
                  defaultTeamId={selected.id}
                />
              )
            }
          />
        ) : (
          <Notice tone="warning" title="That team was not found">
            It may have been removed, or you are not a member. Choose a team from the list.
          </Notice>
        )}
      </div>
      {dialog}
    </>
  );
}
