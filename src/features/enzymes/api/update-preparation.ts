import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import type { preparationUpdateSchema } from '@shared/schemas/enzymes';
import type { Preparation } from '@shared/schemas/records-types';
import { api } from '@/lib/api-client';
import { enzymeKeys } from './keys';

export type PreparationChange = z.output<typeof preparationUpdateSchema>;

export const updatePreparation = (id: string, change: PreparationChange) =>
  api.patch<Preparation>(`/preparations/${encodeURIComponent(id)}`, change);

export function useUpdatePreparation(options: { onSuccess?: (preparation: Preparation) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, change }: { id: string; change: PreparationChange }) => updatePreparation(id, change),
    onSuccess: async (preparation) => {
      await queryClient.invalidateQueries({ queryKey: enzymeKeys.all });
      options.onSuccess?.(preparation);
    },
  });
}
