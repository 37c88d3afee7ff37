// The study's Review tab: its status in PRODUCT.md's words, the steps this user may take (submit,
// withdraw, approve, return, unlock), the history of who did what when, and comments.
import { useQueryClient, type QueryClient } from '@tanstack/react-query';
import { useParams, type LoaderFunctionArgs } from 'react-router';
import { QueryError } from '@/components/ui/notice';
import { Loading } from '@/components/ui/spinner';
import { useToast } from '@/components/ui/toast';
import { analysisKeys } from '@/features/analysis/api/keys';
import { getHistoryQueryOptions, useStudyHistory } from '@/features/review/api/get-history';
import { useReviewStep, type ReviewStep } from '@/features/review/api/review-step';
import { CommentForm } from '@/features/review/components/comment-form';
import { HistoryTimeline } from '@/features/review/components/history-timeline';
import { ReviewActions } from '@/features/review/components/review-actions';
import { ReviewStatus } from '@/features/review/components/review-status';
import { lastEvent, stepsFor } from '@/features/review/utils/review-words';
import { studyKeys } from '@/features/studies/api/keys';
import { useStudy } from '@/features/studies/api/get-study';
import { useCan, useUser, warmCacheFor } from '@/lib/auth';

export const clientLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) =>
    warmCacheFor(queryClient, 'records:read', () =>
      queryClient.ensureQueryData(getHistoryQueryOptions(params.studyId ?? '')),
    );

const done: Record<ReviewStep, string> = {
  submit: 'Submitted for review.',
  withdraw: 'Withdrawn from review; the study is a draft again.',
  approve: 'Approved: the study is locked.',
  return: 'Returned to the author with your comments.',
  unlock: 'Unlocked: the study can be changed again.',
};

export default function StudyReviewRoute() {
  const { studyId = '' } = useParams();
  const study = useStudy(studyId);
  const history = useStudyHistory(studyId);
  const { data: me } = useUser();
  const canComment = useCan('records:write');
  const queryClient = useQueryClient();
  const toast = useToast();
  const step = useReviewStep(studyId, {
    onSuccess: (answer, taken) => {
      void queryClient.invalidateQueries({ queryKey: studyKeys.all });
      void queryClient.invalidateQueries({ queryKey: analysisKeys.study(studyId) });
      const mail =
        answer.mailSent === undefined
          ? ''
          : answer.mailSent
            ? ' An e-mail went to the people concerned.'
            : ' The e-mail could not be sent.';
      toast.show(done[taken] + mail, answer.mailSent === false ? 'warning' : 'success');
    },
  });
  if (!study.data || history.isPending) return <Loading label="Loading the review…" />;
  if (history.isError)
    return <QueryError error={history.error} what="the history" onRetry={() => void history.refetch()} />;
  const status = study.data.status;
  const submitter = lastEvent(history.data, ['submit'])?.author.id;
  return (
    <div className="grid grid-cols-1 items-start gap-6 lg:grid-cols-[minmax(0,1fr)_22rem]">
      <div className="space-y-5">
        <section aria-labelledby="history-title">
          <h2 id="history-title" className="mb-2 text-xl">
            History
          </h2>
          <HistoryTimeline events={history.data} />
        </section>
        {canComment ? (
          <CommentForm studyId={studyId} />
        ) : (
          <p className="text-sm text-ink-muted">Your role reads the comments; it cannot add any.</p>
        )}
      </div>
      <aside className="space-y-3">
        <ReviewStatus status={status} />
        <ReviewActions
          steps={stepsFor(me?.role, status)}
          ownSubmission={Boolean(me && submitter === me.id)}
          busy={step.isPending}
          error={step.error?.message ?? null}
          onStep={(taken, text, close) => step.mutate({ step: taken, text }, { onSuccess: close })}
          onReset={() => step.reset()}
        />
      </aside>
    </div>
  );
}
