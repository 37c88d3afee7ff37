import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import type { variantCreateSchema } from '@shared/schemas/enzymes';
import type { Variant } from '@shared/schemas/records-types';
import { api } from '@/lib/api-client';
import { enzymeKeys } from './keys';

export type VariantCreate = z.output<typeof variantCreateSchema>;

export const createVariant = (enzymeId: string, input: VariantCreate) =>
  api.post<Variant>(`/enzymes/${encodeURIComponent(enzymeId)}/variants`, input);

export function useCreateVariant(options: { onSuccess?: (variant: Variant) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ enzymeId, input }: { enzymeId: string; input: VariantCreate }) =>
      createVariant(enzymeId, input),
    onSuccess: async (variant) => {
      await queryClient.invalidateQueries({ queryKey: enzymeKeys.all });
      options.onSuccess?.(variant);
    },
  });
}
