import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { MembershipChange } from './add-member';
import { teamKeys } from './keys';

export const removeMember = ({ teamId, userId }: MembershipChange) =>
  api.delete<void>(`/teams/${encodeURIComponent(teamId)}/members/${encodeURIComponent(userId)}`);

export function useRemoveMember(options: { onSuccess?: (change: MembershipChange) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: removeMember,
    onSuccess: async (_data, change) => {
      await queryClient.invalidateQueries({ queryKey: teamKeys.all });
      options.onSuccess?.(change);
    },
  });
}
