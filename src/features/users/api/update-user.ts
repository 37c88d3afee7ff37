import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Role } from '@shared/permissions';
import { api } from '@/lib/api-client';
import { userKeys } from './keys';

export type UserChange = { role?: Role; active?: boolean };
export type UserUpdated = { id: string; role: Role; active: boolean };

export const updateUser = (id: string, change: UserChange) =>
  api.patch<UserUpdated>(`/users/${encodeURIComponent(id)}`, change);

export function useUpdateUser(options: { onSuccess?: (result: UserUpdated) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, change }: { id: string; change: UserChange }) => updateUser(id, change),
    onSuccess: async (result) => {
      await queryClient.invalidateQueries({ queryKey: userKeys.all });
      options.onSuccess?.(result);
    },
  });
}
