// One plate: its map in the editor, and the reads imported into it. The editor stays mounted
// while the reads are shown, so switching views keeps unsaved edits.
import { useQueryClient, type QueryClient } from '@tanstack/react-query';
import { Link, useParams, useSearchParams, type LoaderFunctionArgs } from 'react-router';
import { QueryError } from '@/components/ui/notice';
import { SectionHeader } from '@/components/ui/section-header';
import { Loading } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { getPlateQueryOptions, usePlate } from '@/features/plates/api/get-plate';
import { getStudyContextQueryOptions, useStudyContext } from '@/features/plates/api/get-study-context';
import { plateKeys } from '@/features/plates/api/keys';
import { PlateMapEditor } from '@/features/plates/components/plate-map-editor';
import { PlateReads } from '@/features/reads/components/plate-reads';
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

const tabClass = (active: boolean) =>
  `-mb-px border-b-2 px-3 py-1.5 font-semibold ${active ? 'border-accent-700 text-ink' : 'border-transparent text-ink-muted hover:text-ink'}`;

export default function PlateRoute() {
  const { studyId = '', plateId = '' } = useParams();
  const [search, setSearch] = useSearchParams();
  const queryClient = useQueryClient();
  const canWrite = useCan('records:write');
  const plate = usePlate(plateId);
  const study = useStudyContext(studyId);
  const view = search.get('view') === 'reads' ? 'reads' : 'map';

  if (plate.isPending || study.isPending) return <Loading label="Loading the plate…" />;
  if (plate.isError)
    return <QueryError error={plate.error} what="this plate" onRetry={() => void plate.refetch()} />;
  if (study.isError)
    return <QueryError error={study.error} what="the study" onRetry={() => void study.refetch()} />;
  // The editor starts from the map it shows; wait for a fresh copy rather than edit an old one.
  if (plate.isStale && !plate.isFetchedAfterMount) return <Loading label="Loading the plate…" />;
  const p = plate.data;
  const s = study.data;
  const editable = canWrite && (s.status === 'draft' || s.status === 'returned');

  return (
    <>
      <SectionHeader
        above={
          <Link to={paths.studyPlates.href(studyId)} className="text-accent-700 hover:underline">
            Plates
          </Link>
        }
        title={p.name}
        description={`${p.format}-well plate · ${s.assayName}${s.seriesName ? ` · buffer series “${s.seriesName}”` : ''}`}
        actions={
          editable && (
            <Link
              to={paths.plateImport.href(studyId, plateId)}
              className="inline-flex h-9 items-center rounded border border-line-strong bg-surface px-3.5 font-semibold hover:bg-canvas"
            >
              Import reader file
            </Link>
          )
        }
      />
      <div role="tablist" aria-label="Plate views" className="mb-3 flex gap-1 border-b border-line">
        <button
          type="button"
          role="tab"
          aria-selected={view === 'map'}
          className={tabClass(view === 'map')}
          onClick={() => setSearch({})}
        >
          Map
        </button>
        <button
          type="button"
          role="tab"
          aria-selected={view === 'reads'}
          className={tabClass(view === 'reads')}
          onClick={() => setSearch({ view: 'reads' })}
        >
          Reads ({p.readCount})
        </button>
      </div>
      <div hidden={view !== 'map'}>
        <PlateMapEditor key={p.id} plate={p} context={s} canWrite={canWrite} />
      </div>
      {view === 'reads' && (
        <PlateReads
          plateId={p.id}
          format={p.format}
          canDelete={editable}
          onChanged={() => void queryClient.invalidateQueries({ queryKey: plateKeys.all })}
        />
      )}
    </>
  );
}
