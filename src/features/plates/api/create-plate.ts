import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import type { plateCreateSchema } from '@shared/schemas/plates';
import type { PlateSummary } from '@shared/schemas/plates-types';
import { api } from '@/lib/api-client';
import { plateKeys } from './keys';

export type PlateCreateInput = z.input<typeof plateCreateSchema>;

export const createPlate = (studyId: string, input: PlateCreateInput) =>
  api.post<PlateSummary>(`/studies/${encodeURIComponent(studyId)}/plates`, input);

export function useCreatePlate(studyId: string, options: { onSuccess?: (plate: PlateSummary) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: PlateCreateInput) => createPlate(studyId, input),
    onSuccess: async (plate) => {
      await queryClient.invalidateQueries({ queryKey: plateKeys.list(studyId) });
      options.onSuccess?.(plate);
    },
  });
}
