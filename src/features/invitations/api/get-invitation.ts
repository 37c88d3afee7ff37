import { queryOptions, useQuery } from '@tanstack/react-query';
import type { InvitationView } from '@shared/schemas/api-types';
import { api } from '@/lib/api-client';
import { invitationKeys } from './keys';

export const getInvitation = (token: string, signal?: AbortSignal) =>
  api.get<InvitationView>(`/invitations/${encodeURIComponent(token)}`, undefined, signal);

export const getInvitationQueryOptions = (token: string) =>
  queryOptions({
    queryKey: invitationKeys.detail(token),
    queryFn: ({ signal }) => getInvitation(token, signal),
    staleTime: Infinity,
  });

export function useInvitation(token: string) {
  return useQuery(getInvitationQueryOptions(token));
}
