// Bootstrap intervals for the whole study, as a background job: a button to start 1,000 resamples,
// a progress bar polled from the job while it runs (the page stays usable), and the state after.
import { useQueryClient } from '@tanstack/react-query';
import { useEffect, useRef } from 'react';
import type { StudyAnalysis } from '@shared/schemas/analysis';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { ProgressBar } from '@/components/ui/progress-bar';
import { useToast } from '@/components/ui/toast';
import { formatDateTime } from '@/lib/format';
import { isJobActive, useAnalysisJob } from '../api/get-job';
import { analysisKeys } from '../api/keys';
import { BOOTSTRAP_RESAMPLES, useStartBootstrap } from '../api/start-bootstrap';

export type BootstrapControlProps = { analysis: StudyAnalysis; editable: boolean };

export function BootstrapControl({ analysis, editable }: BootstrapControlProps) {
  const queryClient = useQueryClient();
  const toast = useToast();
  const start = useStartBootstrap(analysis.studyId);
  const latest = analysis.job;
  const polled = useAnalysisJob(latest?.id ?? null, isJobActive(latest));
  const job = polled.data ?? latest;
  const active = isJobActive(job);
  const wasActive = useRef(active);
  useEffect(() => {
    // When the job finishes, fetch the analysis again: its intervals now include the bootstrap.
    if (wasActive.current && !active && job) {
      void queryClient.invalidateQueries({ queryKey: analysisKeys.study(analysis.studyId) });
      if (job.state === 'done') toast.show('Bootstrap finished: the tables now show bootstrap intervals.');
    }
    wasActive.current = active;
  }, [active, job, analysis.studyId, queryClient, toast]);

  return (
    <div className="space-y-2">
      {active && job && (
        <div className="max-w-xl">
          <ProgressBar
            fraction={job.total > 0 ? job.done / job.total : 0}
            label={
              job.state === 'queued'
                ? 'Bootstrap waiting to start…'
                : 'Bootstrap running (you can keep working)'
            }
            detail={`${job.done.toLocaleString('en-GB')} of ${job.total.toLocaleString('en-GB')} resample fits`}
          />
        </div>
      )}
      {!active && job?.state === 'failed' && job.current && (
        <Notice tone="warning" title="The last bootstrap did not finish">
          {job.error}
        </Notice>
      )}
      <div className="flex flex-wrap items-center gap-3 text-sm">
        {analysis.bootstrap.current ? (
          <span>
            Bootstrap intervals current: {analysis.bootstrap.resamples?.toLocaleString('en-GB')} resamples,{' '}
            {formatDateTime(analysis.bootstrap.at)}.
          </span>
        ) : (
          <span className="text-ink-muted">
            No current bootstrap: intervals are from the fit (t and profile likelihood).
          </span>
        )}
        {editable && !active && (
          <Button size="sm" busy={start.isPending} onClick={() => start.mutate()}>
            {analysis.bootstrap.current
              ? 'Run the bootstrap again'
              : `Bootstrap intervals (${BOOTSTRAP_RESAMPLES.toLocaleString('en-GB')} resamples)`}
          </Button>
        )}
        {start.error && <span className="text-danger-600">{start.error.message}</span>}
      </div>
    </div>
  );
}
