// Define a new assay (/assays/new) or edit one (/assays/:assayId/edit).
import { useNavigate, useParams } from 'react-router';
import { QueryError } from '@/components/ui/notice';
import { PageHeader } from '@/components/ui/page-header';
import { Loading } from '@/components/ui/spinner';
import { useToast } from '@/components/ui/toast';
import { paths } from '@/config/paths';
import { useAssay } from '@/features/assays/api/get-assay';
import { AssayForm } from '@/features/assays/components/assay-form';
import { useTeams } from '@/features/teams/api/get-teams';

export default function AssayEditRoute() {
  const { assayId } = useParams();
  const navigate = useNavigate();
  const toast = useToast();
  const teams = useTeams();
  const assay = useAssay(assayId);
  const title = assayId ? 'Edit assay' : 'New assay';
  if (teams.isPending || (assayId && assay.isPending)) return <Loading label="Loading…" />;
  if (teams.isError) return <QueryError error={teams.error} what="your teams" />;
  if (assayId && assay.isError) return <QueryError error={assay.error} what="this assay" />;
  return (
    <>
      <PageHeader
        title={assay.data ? `Edit ${assay.data.name}` : title}
        description="Fields appear as they apply to the read mode, detection and quantitation you choose."
      />
      <AssayForm
        teams={teams.data}
        assay={assay.data}
        onSaved={(a) => {
          toast.show(assayId ? 'Assay saved.' : 'Assay created.');
          void navigate(paths.assay.href(a.id));
        }}
        onCancel={() => void navigate(assayId ? paths.assay.href(assayId) : paths.assays.href())}
      />
    </>
  );
}
