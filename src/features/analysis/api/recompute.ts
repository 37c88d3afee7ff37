import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** What POST …/analysis/recompute answers (server/services/analysis/analysis.ts recomputeAndCompare). */
export type RecomputeComparison = {
  stored: { inputHash: string; engineVersion: string; analysisVersion: string; computedAt: string } | null;
  recomputed: { inputHash: string; engineVersion: string; analysisVersion: string };
  sameInputs: boolean;
  differences: {
    variantId: string;
    name: string;
    model: { stored: string | null; recomputed: string | null };
    parameters: Record<
      string,
      { stored: number | null; recomputed: number | null; relativeDifference: number | null }
    >;
  }[];
};

export const recomputeAnalysis = (studyId: string) =>
  api.post<RecomputeComparison>(`/studies/${encodeURIComponent(studyId)}/analysis/recompute`);

/** Recomputes from the stored inputs and compares; stores nothing. */
export function useRecomputeAnalysis() {
  return useMutation({ mutationFn: recomputeAnalysis });
}
