import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import type { studyCreateSchema } from '@shared/schemas/studies';
import type { StudySummary } from '@shared/schemas/records-types';
import { api } from '@/lib/api-client';
import { studyKeys } from './keys';

export type StudyCreate = z.output<typeof studyCreateSchema>;
export type StudyCreated = Pick<StudySummary, 'id' | 'name' | 'teamId' | 'status'>;

export const createStudy = (input: StudyCreate) => api.post<StudyCreated>('/studies', input);

export function useCreateStudy(options: { onSuccess?: (study: StudyCreated) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createStudy,
    onSuccess: async (study) => {
      await queryClient.invalidateQueries({ queryKey: studyKeys.all });
      options.onSuccess?.(study);
    },
  });
}
