// The plates of a study: the list, a new plate (empty, from a template or a copy), copying a
// map into a new plate (here or in another study of the team), renaming and deleting a plate.
import type { QueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { useNavigate, useParams, type LoaderFunctionArgs } from 'react-router';
import type { PlateSummary } from '@shared/schemas/plates-types';
import { Button } from '@/components/ui/button';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { Notice, QueryError } from '@/components/ui/notice';
import { SectionHeader } from '@/components/ui/section-header';
import { Loading } from '@/components/ui/spinner';
import { useToast } from '@/components/ui/toast';
import { paths } from '@/config/paths';
import { useDeletePlate } from '@/features/plates/api/delete-plate';
import { getPlatesQueryOptions, usePlates } from '@/features/plates/api/get-plates';
import { getStudyContextQueryOptions, useStudyContext } from '@/features/plates/api/get-study-context';
import { CopyPlateDialog } from '@/features/plates/components/copy-plate-dialog';
import { NewPlateDialog } from '@/features/plates/components/new-plate-dialog';
import { PlateList } from '@/features/plates/components/plate-list';
import { RenamePlateDialog } from '@/features/plates/components/rename-plate-dialog';
import { ReadOnlyNotice } from '@/features/plates/components/read-only-notice';
import { useCan, warmCacheFor } from '@/lib/auth';

export const clientLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) =>
    warmCacheFor(
      queryClient,
      'records:read',
      () => queryClient.ensureQueryData(getPlatesQueryOptions(params.studyId ?? '')),
      () => queryClient.ensureQueryData(getStudyContextQueryOptions(params.studyId ?? '')),
    );

export default function StudyPlatesRoute() {
  const { studyId = '' } = useParams();
  const navigate = useNavigate();
  const toast = useToast();
  const canWrite = useCan('records:write');
  const plates = usePlates(studyId);
  const study = useStudyContext(studyId);
  const [creating, setCreating] = useState(false);
  const [copying, setCopying] = useState<PlateSummary | null>(null);
  const [deleting, setDeleting] = useState<PlateSummary | null>(null);
  const [renaming, setRenaming] = useState<PlateSummary | null>(null);
  const remove = useDeletePlate({
    onSuccess: () => {
      toast.show(`Plate “${deleting?.name}” deleted.`);
      setDeleting(null);
    },
  });

  if (plates.isPending || study.isPending) return <Loading label="Loading the plates…" />;
  if (study.isError)
    return <QueryError error={study.error} what="this study" onRetry={() => void study.refetch()} />;
  if (plates.isError)
    return <QueryError error={plates.error} what="the plates" onRetry={() => void plates.refetch()} />;
  const s = study.data;
  const editable = canWrite && (s.status === 'draft' || s.status === 'returned');
  const plateHref = (p: PlateSummary) => paths.plate.href(studyId, p.id);
  const importHref = (p: PlateSummary) => paths.plateImport.href(studyId, p.id);

  return (
    <>
      <SectionHeader
        title="Plates"
        description={`Plate maps of this study and the reader files imported into them. Assay: ${s.assayName}.`}
        actions={
          editable && (
            <Button variant="primary" onClick={() => setCreating(true)}>
              New plate
            </Button>
          )
        }
      />
      {!editable && (s.status === 'in_review' || s.status === 'approved' || !canWrite) && (
        <ReadOnlyNotice status={s.status} canWrite={canWrite} />
      )}
      {s.phPoints.length === 0 && editable && (
        <Notice tone="warning" title="No buffer series yet" className="mb-3">
          The study has no buffer series, so the editor has no pH points to fill. Attach one on the study's
          Buffers page.
        </Notice>
      )}
      <div className="mt-3">
        <PlateList
          plates={plates.data}
          plateHref={plateHref}
          importHref={importHref}
          onCopy={editable ? setCopying : undefined}
          onRename={editable ? setRenaming : undefined}
          onDelete={editable ? setDeleting : undefined}
        />
      </div>
      {editable && (
        <NewPlateDialog
          open={creating}
          onClose={() => setCreating(false)}
          studyId={studyId}
          teamId={s.teamId}
          plates={plates.data}
          onCreated={(p) => void navigate(plateHref(p))}
        />
      )}
      <CopyPlateDialog
        plate={copying}
        studyId={studyId}
        onClose={() => setCopying(null)}
        onCopied={(copy) => {
          setCopying(null);
          toast.show(`Map copied into the new plate “${copy.name}”.`);
          if (copy.studyId === studyId) void navigate(plateHref(copy));
        }}
      />
      <RenamePlateDialog
        plate={renaming}
        onClose={() => setRenaming(null)}
        onRenamed={(name) => {
          toast.show(`Plate “${renaming?.name}” renamed to “${name}”.`);
          setRenaming(null);
        }}
      />
      <ConfirmDialog
        open={deleting !== null}
        title={`Delete ${deleting?.name ?? 'the plate'}?`}
        confirmLabel="Delete plate"
        busy={remove.isPending}
        error={remove.error?.message}
        onConfirm={() => deleting && remove.mutate(deleting.id)}
        onCancel={() => {
          setDeleting(null);
          remove.reset();
        }}
      >
        <p>
          The plate, its map and its {deleting?.readCount ?? 0} imported read(s) with their raw files are
          removed. This cannot be undone.
        </p>
      </ConfirmDialog>
    </>
  );
}
