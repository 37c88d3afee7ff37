import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { StudyStatus } from '@shared/schemas/studies';
import { api } from '@/lib/api-client';
import { reviewKeys } from './keys';

export type ReviewStep = 'submit' | 'withdraw' | 'approve' | 'return' | 'unlock';
export type ReviewAnswer = { status: StudyStatus; mailSent?: boolean };

/** What each step sends: the optional message, comment or reason in the field the server reads. */
const bodyOf: Record<ReviewStep, (text: string) => object> = {
  submit: (text) => ({ message: text }),
  withdraw: () => ({}),
  approve: (text) => ({ comment: text }),
  return: (text) => ({ comment: text }),
  unlock: (text) => ({ reason: text }),
};

export const takeReviewStep = (studyId: string, step: ReviewStep, text = '') =>
  api.post<ReviewAnswer>(`/studies/${encodeURIComponent(studyId)}/${step}`, bodyOf[step](text.trim()));

/**
 * One step of the review (POST /studies/:id/submit | withdraw | approve | return | unlock). The
 * history is refetched here; the caller refreshes the study itself (its status) in `onSuccess`.
 */
export function useReviewStep(
  studyId: string,
  options: { onSuccess?: (answer: ReviewAnswer, step: ReviewStep) => void } = {},
) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ step, text }: { step: ReviewStep; text?: string }) => takeReviewStep(studyId, step, text),
    onSuccess: async (answer, { step }) => {
      await queryClient.invalidateQueries({ queryKey: reviewKeys.history(studyId) });
      options.onSuccess?.(answer, step);
    },
  });
}
