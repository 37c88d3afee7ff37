import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import type { assayCreateSchema } from '@shared/schemas/assays';
import type { Assay } from '@shared/schemas/records-types';
import { api } from '@/lib/api-client';
import { assayKeys } from './keys';

export type AssayCreate = z.output<typeof assayCreateSchema>;

export const createAssay = (input: AssayCreate) => api.post<Assay>('/assays', input);

export function useCreateAssay(options: { onSuccess?: (assay: Assay) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createAssay,
    onSuccess: async (assay) => {
      await queryClient.invalidateQueries({ queryKey: assayKeys.all });
      options.onSuccess?.(assay);
    },
  });
}
