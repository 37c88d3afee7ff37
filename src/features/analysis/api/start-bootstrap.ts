import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { AnalysisJob, StudyAnalysis } from '@shared/schemas/analysis';
import { api } from '@/lib/api-client';
import { analysisKeys } from './keys';

export const BOOTSTRAP_RESAMPLES = 1000;

export const startBootstrap = (studyId: string, resamples = BOOTSTRAP_RESAMPLES) =>
  api.post<AnalysisJob>(`/studies/${encodeURIComponent(studyId)}/analysis/bootstrap`, { resamples });

/** Starts the background bootstrap; the job is put on the cached analysis so the page shows its progress. */
export function useStartBootstrap(studyId: string, options: { onSuccess?: (job: AnalysisJob) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => startBootstrap(studyId),
    onSuccess: (job) => {
      queryClient.setQueryData<StudyAnalysis>(analysisKeys.study(studyId), (old) =>
        old ? { ...old, job } : old,
      );
      queryClient.setQueryData(analysisKeys.job(job.id), job);
      options.onSuccess?.(job);
    },
  });
}
