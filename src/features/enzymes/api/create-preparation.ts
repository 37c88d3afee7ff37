import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import type { preparationCreateSchema } from '@shared/schemas/enzymes';
import type { Preparation } from '@shared/schemas/records-types';
import { api } from '@/lib/api-client';
import { enzymeKeys } from './keys';

export type PreparationCreate = z.output<typeof preparationCreateSchema>;

export const createPreparation = (variantId: string, input: PreparationCreate) =>
  api.post<Preparation>(`/variants/${encodeURIComponent(variantId)}/preparations`, input);

export function useCreatePreparation(options: { onSuccess?: (preparation: Preparation) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ variantId, input }: { variantId: string; input: PreparationCreate }) =>
      createPreparation(variantId, input),
    onSuccess: async (preparation) => {
      await queryClient.invalidateQueries({ queryKey: enzymeKeys.all });
      options.onSuccess?.(preparation);
    },
  });
}
