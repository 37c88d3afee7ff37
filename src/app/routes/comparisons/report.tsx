// The printable report of a saved comparison: the overlaid curves, the tables of values and of
// differences to the reference, the global fit in words, provenance of every fit, and the cautions.
import { useParams } from 'react-router';
import { QueryError } from '@/components/ui/notice';
import { Loading } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { useComparison } from '@/features/comparisons/api/get-comparison';
import { useComparisons } from '@/features/comparisons/api/get-comparisons';
import { ComparisonChart } from '@/features/comparisons/components/comparison-chart';
import { ComparisonPrintTables } from '@/features/comparisons/components/comparison-print-tables';
import { ComparisonSummary } from '@/features/comparisons/components/comparison-summary';
import { GlobalFitResult } from '@/features/comparisons/components/global-fit-result';
import { ProvenanceTable } from '@/features/comparisons/components/provenance-table';
import { curveLabels, profileStyles } from '@/features/comparisons/utils/colors';
import { ReportPage } from '@/features/reports/components/report-page';
import { ReportSection } from '@/features/reports/components/report-section';
import { useTeams } from '@/features/teams/api/get-teams';
import { formatDateTime } from '@/lib/format';

export default function ComparisonReportRoute() {
  const { comparisonId = '' } = useParams();
  const comparison = useComparison(comparisonId);
  const teams = useTeams();
  // The saved list names who saved it (the single comparison does not).
  const list = useComparisons();
  if (comparison.isPending) return <Loading label="Preparing the report…" />;
  if (comparison.isError)
    return (
      <QueryError error={comparison.error} what="this comparison" onRetry={() => void comparison.refetch()} />
    );
  const c = comparison.data;
  const { view } = c;
  const styles = profileStyles(view.curves.map((x) => x.key));
  const labels = curveLabels(view.result.rows);
  const curves = view.curves.map((x) => ({ ...x, label: labels[x.key] ?? x.label }));
  const teamName = teams.data?.find((t) => t.id === c.teamId)?.name;
  return (
    <ReportPage
      title={c.name}
      back={{ href: paths.comparison.href(c.id), label: 'Back to the comparison' }}
      subtitle={
        <p>
          Comparison of {view.result.rows.length} profiles{teamName ? ` · ${teamName}` : ''} · printed{' '}
          {formatDateTime(new Date().toISOString())}
        </p>
      }
    >
      <ReportSection title="Comparison" keep>
        <div className="text-sm">
          <ComparisonSummary
            saved={c}
            view={view}
            teamName={teamName}
            createdByName={list.data?.find((x) => x.id === c.id)?.createdByName}
          />
        </div>
      </ReportSection>
      <ReportSection title="Relative activity">
        <ComparisonChart
          curves={curves}
          styles={styles}
          referenceKey={view.result.referenceKey}
          hidden={new Set()}
          height={340}
        />
      </ReportSection>
      <ReportSection title="Values and differences to the reference">
        <ComparisonPrintTables result={view.result} units={view.units} styles={styles} />
      </ReportSection>
      {view.globalFit && (
        <ReportSection title="Global fit" keep>
          <GlobalFitResult globalFit={view.globalFit} />
        </ReportSection>
      )}
      <ReportSection title="Provenance" keep>
        <ProvenanceTable view={view} open />
      </ReportSection>
    </ReportPage>
  );
}
