import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import type { studyUpdateSchema } from '@shared/schemas/studies';
import { api } from '@/lib/api-client';
import type { StudyCreated } from './create-study';
import { studyKeys } from './keys';

export type StudyChange = z.output<typeof studyUpdateSchema>;

export const updateStudy = (id: string, change: StudyChange) =>
  api.patch<StudyCreated>(`/studies/${encodeURIComponent(id)}`, change);

export function useUpdateStudy(options: { onSuccess?: (study: StudyCreated) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, change }: { id: string; change: StudyChange }) => updateStudy(id, change),
    onSuccess: async (study) => {
      await queryClient.invalidateQueries({ queryKey: studyKeys.all });
      options.onSuccess?.(study);
    },
  });
}
