import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { AcceptInvitationInput } from '@shared/schemas/auth';
import { api } from '@/lib/api-client';
import { invitationKeys } from './keys';

export const acceptInvitation = (token: string, input: AcceptInvitationInput) =>
  api.post<{ email: string }>(`/invitations/${encodeURIComponent(token)}/accept`, input);

export function useAcceptInvitation(
  token: string,
  options: { onSuccess?: (result: { email: string }) => void } = {},
) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: AcceptInvitationInput) => acceptInvitation(token, input),
    onSuccess: (result) => {
      // The link is used up now; do not show it as open from the cache.
      queryClient.removeQueries({ queryKey: invitationKeys.detail(token) });
      options.onSuccess?.(result);
    },
  });
}
