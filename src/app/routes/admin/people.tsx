import { useQueryClient, type QueryClient } from '@tanstack/react-query';
import { PageHeader } from '@/components/ui/page-header';
import { QueryError } from '@/components/ui/notice';
import { Loading } from '@/components/ui/spinner';
import { InviteButton } from '@/features/invitations/components/invite-button';
import { invitableRoles } from '@/features/invitations/utils/invitable-roles';
import { useTeams } from '@/features/teams/api/get-teams';
import { teamKeys } from '@/features/teams/api/keys';
import { getUsersQueryOptions, useUsers } from '@/features/users/api/get-users';
import { PeopleTable } from '@/features/users/components/people-table';
import { useUser, warmCacheFor } from '@/lib/auth';
import { meQueryKey } from '@/lib/query-client';

export const clientLoader = (queryClient: QueryClient) => () =>
  warmCacheFor(queryClient, 'users:read', () => queryClient.ensureQueryData(getUsersQueryOptions()));

export default function PeopleRoute() {
  const { data: me } = useUser();
  const queryClient = useQueryClient();
  const users = useUsers();
  const teams = useTeams();
  if (!me) return null;

  const header = (
    <PageHeader
      title="People"
      description="Everyone with a Bellwether account. Change a role, deactivate an account, or invite someone new."
    />
  );
  if (users.isPending)
    return (
      <>
        {header}
        <Loading label="Loading people…" />
      </>
    );
  if (users.isError)
    return (
      <>
        {header}
        <QueryError error={users.error} what="the people" onRetry={() => void users.refetch()} />
      </>
    );

  const onChanged = (userId: string) => {
    // Roles show up in team member lists; your own change also changes your menu.
    void queryClient.invalidateQueries({ queryKey: teamKeys.all });
    if (userId === me.id) void queryClient.invalidateQueries({ queryKey: meQueryKey });
  };
  return (
    <>
      {header}
      <PeopleTable
        users={users.data}
        currentUserId={me.id}
        onChanged={onChanged}
        toolbar={
          <InviteButton roles={invitableRoles(me.role)} teams={teams.data ?? []} teamRequired={false} />
        }
      />
    </>
  );
}
