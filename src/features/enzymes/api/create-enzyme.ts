import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import type { enzymeCreateSchema } from '@shared/schemas/enzymes';
import type { Enzyme } from '@shared/schemas/records-types';
import { api } from '@/lib/api-client';
import { enzymeKeys } from './keys';

export type EnzymeCreate = z.output<typeof enzymeCreateSchema>;

export const createEnzyme = (input: EnzymeCreate) => api.post<Enzyme>('/enzymes', input);

export function useCreateEnzyme(options: { onSuccess?: (enzyme: Enzyme) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createEnzyme,
    onSuccess: async (enzyme) => {
      await queryClient.invalidateQueries({ queryKey: enzymeKeys.all });
      options.onSuccess?.(enzyme);
    },
  });
}
