import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export const completePasswordReset = (input: { token: string; newPassword: string }) =>
  api.post<void>('/auth/password-reset/complete', input);

export function useCompletePasswordReset(options: { onSuccess?: () => void } = {}) {
  return useMutation({ mutationFn: completePasswordReset, onSuccess: () => options.onSuccess?.() });
}
