import { useMutation } from '@tanstack/react-query';
import type { z } from 'zod';
import type { resetRequestSchema } from '@shared/schemas/auth';
import { api } from '@/lib/api-client';

export type ResetRequestInput = z.input<typeof resetRequestSchema>;

/** The answer is worded by the server and never says whether the address has an account. */
export const requestPasswordReset = (input: ResetRequestInput) =>
  api.post<{ message: string }>('/auth/password-reset', input);

export function useRequestPasswordReset() {
  return useMutation({ mutationFn: requestPasswordReset });
}
