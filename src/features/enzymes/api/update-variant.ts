import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import type { variantUpdateSchema } from '@shared/schemas/enzymes';
import type { Variant } from '@shared/schemas/records-types';
import { api } from '@/lib/api-client';
import { enzymeKeys } from './keys';

export type VariantChange = z.output<typeof variantUpdateSchema>;

export const updateVariant = (id: string, change: VariantChange) =>
  api.patch<Variant>(`/variants/${encodeURIComponent(id)}`, change);

export function useUpdateVariant(options: { onSuccess?: (variant: Variant) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, change }: { id: string; change: VariantChange }) => updateVariant(id, change),
    onSuccess: async (variant) => {
      await queryClient.invalidateQueries({ queryKey: enzymeKeys.all });
      options.onSuccess?.(variant);
    },
  });
}
