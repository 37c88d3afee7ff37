// The study's Overview tab: everything it is made of, and edit/delete while it is a draft or was
// returned. In review or approved, edits are hidden and a note says why.
import { useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { Link, useNavigate, useParams } from 'react-router';
import { Button } from '@/components/ui/button';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { Dialog } from '@/components/ui/dialog';
import { Notice } from '@/components/ui/notice';
import { Loading } from '@/components/ui/spinner';
import { useToast } from '@/components/ui/toast';
import { paths } from '@/config/paths';
import { useSeries } from '@/features/buffer-series/api/get-series';
import { seriesKeys } from '@/features/buffer-series/api/keys';
import { SeriesSummaryCard } from '@/features/buffer-series/components/series-summary';
import { useEnzyme } from '@/features/enzymes/api/get-enzyme';
import { ExportButtons } from '@/features/reports/components/export-buttons';
import { useDeleteStudy } from '@/features/studies/api/delete-study';
import { useStudy } from '@/features/studies/api/get-study';
import { StudyForm } from '@/features/studies/components/study-form';
import { StudyOverview } from '@/features/studies/components/study-overview';
import { isEditable, lockReason } from '@/features/studies/utils/study-status';
import { useTeams } from '@/features/teams/api/get-teams';
import { useCan } from '@/lib/auth';
import { useStudyOptions } from './study-options';

export default function StudyOverviewRoute() {
  const { studyId = '' } = useParams();
  const study = useStudy(studyId);
  const canWrite = useCan('records:write');
  const series = useSeries(study.data?.bufferSeriesId);
  const [editing, setEditing] = useState(false);
  const [deleting, setDeleting] = useState(false);
  const navigate = useNavigate();
  const toast = useToast();
  const remove = useDeleteStudy({
    onSuccess: () => {
      toast.show('Study deleted.');
      void navigate(paths.studies.href());
    },
  });
  if (!study.data) return null;
  const s = study.data;
  const reason = lockReason(s.status);
  const mayEdit = canWrite && isEditable(s.status);
  const seriesSlot = !s.bufferSeriesId ? (
    <p className="text-ink-muted">
      None yet.{' '}
      {mayEdit && (
        <Link to={paths.studyBuffers.href(s.id)} className="text-accent-700 hover:underline">
          Design or attach one
        </Link>
      )}
    </p>
  ) : series.data ? (
    <SeriesSummaryCard series={series.data} studyBuffersHref={paths.studyBuffers.href(s.id)} />
  ) : series.isError ? (
    <p className="text-danger-600">{series.error.message}</p>
  ) : (
    <Loading label="Loading the series…" />
  );
  return (
    <>
      {reason && (
        <Notice tone="info" className="mb-4">
          {reason}
        </Notice>
      )}
      <div className="mb-4 flex items-center gap-2">
        {mayEdit && (
          <>
            <Button onClick={() => setEditing(true)}>Edit study</Button>
            <Button onClick={() => setDeleting(true)}>Delete study</Button>
          </>
        )}
        {/* Exports and the printable report (issue 7): every role reads them. */}
        <div className="ml-auto flex items-center gap-1.5">
          <Link
            to={paths.studyReport.href(s.id)}
            className="inline-flex h-7 items-center rounded border border-line-strong bg-surface px-2.5 text-sm font-semibold hover:bg-canvas"
          >
            Printable report
          </Link>
          <ExportButtons kind="study" id={s.id} name={s.name} />
        </div>
      </div>
      <StudyOverview study={s} bufferSeries={seriesSlot} />
      {editing && <EditStudyDialog studyId={s.id} onClose={() => setEditing(false)} />}
      <ConfirmDialog
        open={deleting}
        title={`Delete ${s.name}?`}
        confirmLabel="Delete study"
        busy={remove.isPending}
        error={remove.error?.message}
        onCancel={() => {
          remove.reset();
          setDeleting(false);
        }}
        onConfirm={() => remove.mutate(s.id)}
      >
        <p>
          The study, its variant list and its plates go; the enzyme, the assay and the buffer series stay.
        </p>
      </ConfirmDialog>
    </>
  );
}

function EditStudyDialog({ studyId, onClose }: { studyId: string; onClose: () => void }) {
  const study = useStudy(studyId);
  const teams = useTeams();
  const enzyme = useEnzyme(study.data?.enzymeId);
  const queryClient = useQueryClient();
  const { pending, options } = useStudyOptions();
  const toast = useToast();
  const ready = study.data && teams.data && !pending;
  return (
    <Dialog open onClose={onClose} title="Edit study" width="lg">
      {!ready ? (
        <Loading />
      ) : (
        <StudyForm
          study={study.data}
          teams={teams.data}
          enzymes={options.enzymes}
          assays={options.assays}
          series={options.series}
          variants={enzyme.data?.variants}
          onEnzymeChange={noop}
          onSaved={() => {
            toast.show('Study saved.');
            void queryClient.invalidateQueries({ queryKey: seriesKeys.all });
            onClose();
          }}
          onCancel={onClose}
        />
      )}
    </Dialog>
  );
}

const noop = () => {};
