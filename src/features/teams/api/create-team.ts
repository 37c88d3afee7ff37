import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { TeamCreateInput } from '@shared/schemas/teams';
import { api } from '@/lib/api-client';
import { teamKeys } from './keys';

export type TeamCreated = { id: string; name: string; description: string };

export const createTeam = (input: TeamCreateInput) => api.post<TeamCreated>('/teams', input);

export function useCreateTeam(options: { onSuccess?: (team: TeamCreated) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createTeam,
    onSuccess: async (team) => {
      await queryClient.invalidateQueries({ queryKey: teamKeys.all });
      options.onSuccess?.(team);
    },
  });
}
