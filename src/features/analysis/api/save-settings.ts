import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { StudyAnalysis, StudyAnalysisSettings } from '@shared/schemas/analysis';
import { request } from '@/lib/api-client';
import { analysisKeys } from './keys';

export type SettingsSave = { studyId: string; version: number; settings: StudyAnalysisSettings };

/** Saves with the version the screen was showing; an older one is answered 409 stale_version. */
export const saveAnalysisSettings = ({ studyId, version, settings }: SettingsSave) =>
  request<StudyAnalysis>(`/studies/${encodeURIComponent(studyId)}/analysis/settings`, {
    method: 'PUT',
    body: { version, settings },
  });

/** The answer is the refitted analysis: it replaces the cached one at once. */
export function useSaveAnalysisSettings(options: { onSuccess?: (analysis: StudyAnalysis) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: saveAnalysisSettings,
    onSuccess: (analysis) => {
      queryClient.setQueryData(analysisKeys.study(analysis.studyId), analysis);
      options.onSuccess?.(analysis);
    },
  });
}
