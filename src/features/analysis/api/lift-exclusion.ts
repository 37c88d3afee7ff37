import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { StudyAnalysis } from '@shared/schemas/analysis';
import { api } from '@/lib/api-client';
import { analysisKeys } from './keys';

export type LiftRequest = { exclusionId: string; reason: string };

export const liftExclusion = ({ exclusionId, reason }: LiftRequest) =>
  api.post<StudyAnalysis>(`/exclusions/${encodeURIComponent(exclusionId)}/lift`, { reason });

/** Includes an excluded well again, with a reason; the answer is the refitted analysis. */
export function useLiftExclusion(options: { onSuccess?: (analysis: StudyAnalysis) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: liftExclusion,
    onSuccess: (analysis) => {
      queryClient.setQueryData(analysisKeys.study(analysis.studyId), analysis);
      options.onSuccess?.(analysis);
    },
  });
}
