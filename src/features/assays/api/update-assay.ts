import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import type { assayUpdateSchema } from '@shared/schemas/assays';
import type { Assay } from '@shared/schemas/records-types';
import { api } from '@/lib/api-client';
import { assayKeys } from './keys';

export type AssayChange = z.output<typeof assayUpdateSchema>;

export const updateAssay = (id: string, change: AssayChange) =>
  api.patch<Assay>(`/assays/${encodeURIComponent(id)}`, change);

export function useUpdateAssay(options: { onSuccess?: (assay: Assay) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, change }: { id: string; change: AssayChange }) => updateAssay(id, change),
    onSuccess: async (assay) => {
      await queryClient.invalidateQueries({ queryKey: assayKeys.all });
      options.onSuccess?.(assay);
    },
  });
}
