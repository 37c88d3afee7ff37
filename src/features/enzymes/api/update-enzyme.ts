import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import type { enzymeUpdateSchema } from '@shared/schemas/enzymes';
import type { Enzyme } from '@shared/schemas/records-types';
import { api } from '@/lib/api-client';
import { enzymeKeys } from './keys';

export type EnzymeChange = z.output<typeof enzymeUpdateSchema>;

export const updateEnzyme = (id: string, change: EnzymeChange) =>
  api.patch<Enzyme>(`/enzymes/${encodeURIComponent(id)}`, change);

export function useUpdateEnzyme(options: { onSuccess?: (enzyme: Enzyme) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, change }: { id: string; change: EnzymeChange }) => updateEnzyme(id, change),
    onSuccess: async (enzyme) => {
      await queryClient.invalidateQueries({ queryKey: enzymeKeys.all });
      options.onSuccess?.(enzyme);
    },
  });
}
