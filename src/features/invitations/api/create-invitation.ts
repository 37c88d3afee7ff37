import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { InvitationCreateInput } from '@shared/schemas/auth';
import { api } from '@/lib/api-client';
import { invitationKeys } from './keys';

export type InvitationCreated = { email: string; expiresAt: string; mailSent: boolean };

export const createInvitation = (input: InvitationCreateInput) =>
  api.post<InvitationCreated>('/invitations', input);

export function useCreateInvitation(options: { onSuccess?: (result: InvitationCreated) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createInvitation,
    onSuccess: async (result) => {
      await queryClient.invalidateQueries({ queryKey: invitationKeys.all });
      options.onSuccess?.(result);
    },
  });
}
