// Importing a reader file into a plate: choose the file, see what was found, confirm, and land
// on the plate's reads.
import { useQueryClient, type QueryClient } from '@tanstack/react-query';
import { Link, useNavigate, useParams, type LoaderFunctionArgs } from 'react-router';
import { QueryError } from '@/components/ui/notice';
import { SectionHeader } from '@/components/ui/section-header';
import { Loading } from '@/components/ui/spinner';
import { useToast } from '@/components/ui/toast';
import { paths } from '@/config/paths';
import { getPlateQueryOptions, usePlate } from '@/features/plates/api/get-plate';
import { getStudyContextQueryOptions, useStudyContext } from '@/features/plates/api/get-study-context';
import { plateKeys } from '@/features/plates/api/keys';
import { ReadOnlyNotice } from '@/features/plates/components/read-only-notice';
import { ImportReaderFile } from '@/features/reads/components/import-reader-file';
import { useCan, warmCacheFor } from '@/lib/auth';

export const clientLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) =>
    warmCacheFor(
      queryClient,
      'records:read',
      () => queryClient.ensureQueryData(getPlateQueryOptions(params.plateId ?? '')),
      () => queryClient.ensureQueryData(getStudyContextQueryOptions(params.studyId ?? '')),
    );

export default function PlateImportRoute() {
  const { studyId = '', plateId = '' } = useParams();
  const navigate = useNavigate();
  const toast = useToast();
  const queryClient = useQueryClient();
  const canWrite = useCan('records:write');
  const plate = usePlate(plateId);
  const study = useStudyContext(studyId);

  if (plate.isPending || study.isPending) return <Loading label="Loading the plate…" />;
  if (plate.isError)
    return <QueryError error={plate.error} what="this plate" onRetry={() => void plate.refetch()} />;
  if (study.isError)
    return <QueryError error={study.error} what="the study" onRetry={() => void study.refetch()} />;
  const p = plate.data;
  const s = study.data;
  const editable = canWrite && (s.status === 'draft' || s.status === 'returned');
  const back = paths.plate.href(studyId, plateId, 'reads');

  return (
    <>
      <SectionHeader
        above={
          <>
            <Link to={paths.studyPlates.href(studyId)} className="text-accent-700 hover:underline">
              Plates
            </Link>
            {' › '}
            <Link to={back} className="text-accent-700 hover:underline">
              {p.name}
            </Link>
          </>
        }
        title={`Import a reader file into ${p.name}`}
        description={`A ${p.format}-well plate. The file is read first and nothing is stored until you confirm; then the raw file is kept unchanged with its SHA-256.`}
      />
      {editable ? (
        <ImportReaderFile
          plateId={p.id}
          plateFormat={p.format}
          onCancel={() => void navigate(back)}
          onImported={(result, fileName) => {
            void queryClient.invalidateQueries({ queryKey: plateKeys.all });
            toast.show(`${result.readIds.length} read(s) imported from ${fileName}.`);
            void navigate(back);
          }}
        />
      ) : (
        <ReadOnlyNotice status={s.status} canWrite={canWrite} />
      )}
    </>
  );
}
