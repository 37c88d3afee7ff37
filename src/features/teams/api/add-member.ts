import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { teamKeys } from './keys';

export type MembershipChange = { teamId: string; userId: string };

export const addMember = ({ teamId, userId }: MembershipChange) =>
  api.post<void>(`/teams/${encodeURIComponent(teamId)}/members`, { userId });

export function useAddMember(options: { onSuccess?: (change: MembershipChange) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: addMember,
    onSuccess: async (_data, change) => {
      await queryClient.invalidateQueries({ queryKey: teamKeys.all });
      options.onSuccess?.(change);
    },
  });
}
