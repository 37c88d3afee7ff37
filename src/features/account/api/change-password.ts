import { useMutation } from '@tanstack/react-query';
import type { ChangePasswordInput } from '@shared/schemas/auth';
import { api } from '@/lib/api-client';

export const changePassword = (input: ChangePasswordInput) => api.post<void>('/me/password', input);

export function useChangePassword(options: { onSuccess?: () => void } = {}) {
  return useMutation({ mutationFn: changePassword, onSuccess: () => options.onSuccess?.() });
}
