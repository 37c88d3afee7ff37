import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ExclusionCreate, StudyAnalysis } from '@shared/schemas/analysis';
import { api } from '@/lib/api-client';
import { analysisKeys } from './keys';

export type ExclusionRequest = { studyId: string } & ExclusionCreate;

export const excludeWells = ({ studyId, ...body }: ExclusionRequest) =>
  api.post<StudyAnalysis>(`/studies/${encodeURIComponent(studyId)}/exclusions`, body);

/** Excludes wells (of one or several plates) with a reason; the answer is the refitted analysis. */
export function useExcludeWells(options: { onSuccess?: (analysis: StudyAnalysis) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: excludeWells,
    onSuccess: (analysis) => {
      queryClient.setQueryData(analysisKeys.study(analysis.studyId), analysis);
      options.onSuccess?.(analysis);
    },
  });
}
