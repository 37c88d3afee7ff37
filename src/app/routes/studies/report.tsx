// The printable report of a study: the curves (all variants overlaid, then one chart each), the
// parameter table, plate QC, exclusions with reasons, the review history, provenance with raw-file
// hashes, and the cautions. Composes the study, analysis, review, plate and read features.
import { useQueries, useQuery } from '@tanstack/react-query';
import { useParams } from 'react-router';
import { studyStatusLabels } from '@shared/schemas/studies';
import { Notice, QueryError } from '@/components/ui/notice';
import { Loading } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { getAnalysisQueryOptions } from '@/features/analysis/api/get-analysis';
import { useAssay } from '@/features/assays/api/get-assay';
import { ComparisonChart } from '@/features/comparisons/components/comparison-chart';
import { profileStyles } from '@/features/comparisons/utils/colors';
import { usePlates } from '@/features/plates/api/get-plates';
import { getReadsQueryOptions } from '@/features/reads/api/get-reads';
import { ApprovalsTable } from '@/features/reports/components/approvals-table';
import { ExclusionsTable } from '@/features/reports/components/exclusions-table';
import { ParameterTable } from '@/features/reports/components/parameter-table';
import { ProfileCharts } from '@/features/reports/components/profile-charts';
import { ProvenanceList, type RawFile } from '@/features/reports/components/provenance-list';
import { QcSummary } from '@/features/reports/components/qc-summary';
import { ReportPage } from '@/features/reports/components/report-page';
import { ReportSection } from '@/features/reports/components/report-section';
import { relativeCurves } from '@/features/reports/utils/profile-chart-data';
import { useStudyHistory } from '@/features/review/api/get-history';
import { useStudy } from '@/features/studies/api/get-study';
import { formatDateTime } from '@/lib/format';

export default function StudyReportRoute() {
  const { studyId = '' } = useParams();
  const study = useStudy(studyId);
  const analysis = useQuery(getAnalysisQueryOptions(studyId));
  const history = useStudyHistory(studyId);
  const assay = useAssay(study.data?.assayId);
  const plates = usePlates(studyId);
  const reads = useQueries({ queries: (plates.data ?? []).map((p) => getReadsQueryOptions(p.id)) });
  const files = rawFiles(
    plates.data ?? [],
    reads.map((r) => r.data),
  );
  const back = { href: paths.study.href(studyId), label: 'Back to the study' };

  if (study.isPending || analysis.isPending) return <Loading label="Preparing the report…" />;
  if (study.isError)
    return <QueryError error={study.error} what="this study" onRetry={() => void study.refetch()} />;
  if (analysis.isError)
    return (
      <QueryError
        error={analysis.error}
        what="the analysis of this study"
        onRetry={() => void analysis.refetch()}
      />
    );

  const s = study.data;
  const a = analysis.data;
  const { result } = a;
  const approved = s.status === 'approved';
  const bootstrapCurrent = a.bootstrap.current;
  const variantNames = Object.fromEntries(result.profiles.map((p) => [p.variantId, p.name]));
  const temperature = assay.data ? ` at ${assay.data.temperatureC} °C` : '';
  const xLabel = `pH${temperature}`;
  const yLabel = `${result.units.activityLabel} (${result.units.activity})`;
  // The study's status is said once at the top; the curves do not repeat it.
  const curves = relativeCurves(result.profiles, true);
  const reference = result.profiles.find((p) => p.isReference);
  const readsLoading = plates.isPending || reads.some((r) => r.isPending);
  const readsFailed = plates.isError || reads.some((r) => r.isError);

  return (
    <ReportPage
      title={s.name}
      back={back}
      subtitle={
        <p>
          {studyStatusLabels[s.status]} · {s.enzymeName} · {s.teamName} · owner {s.ownerName} · printed{' '}
          {formatDateTime(new Date().toISOString())}
        </p>
      }
    >
      {!approved && (
        <Notice tone="warning" title="Not approved">
          This study is {studyStatusLabels[s.status].toLowerCase()}: its analysis may still change.
        </Notice>
      )}
      <ReportSection title="Study" keep>
        <dl className="grid grid-cols-[11rem_1fr] gap-x-3 gap-y-0.5 text-sm">
          <dt className="text-ink-muted">Assay</dt>
          <dd>
            {s.assayName}
            {assay.data &&
              ` — ${assay.data.readMode === 'kinetic' ? 'kinetic' : 'end point'}, ${assay.data.detection} ${assay.data.wavelengthNm} nm, ${assay.data.temperatureC} °C, substrate ${assay.data.substrate} ${assay.data.substrateMm} mM (${assay.data.substrateRegime})`}
          </dd>
          <dt className="text-ink-muted">Variants</dt>
          <dd>
            {result.profiles.map((p) => p.name).join(', ')}
            {reference && ` (reference ${reference.name})`}
          </dd>
          <dt className="text-ink-muted">Activity</dt>
          <dd>
            {result.units.activityLabel} ({result.units.activity}). {result.units.note}
          </dd>
          {s.notes && (
            <>
              <dt className="text-ink-muted">Notes</dt>
              <dd className="whitespace-pre-wrap">{s.notes}</dd>
            </>
          )}
        </dl>
        {assay.data && assay.data.cautions.length > 0 && (
          <ul className="mt-2 list-disc pl-5 text-sm text-warn-800">
            {assay.data.cautions.map((c) => (
              <li key={c}>{c}</li>
            ))}
          </ul>
        )}
      </ReportSection>
      <ReportSection title="All variants, relative activity">
        <ComparisonChart
          curves={curves}
          styles={profileStyles(curves.map((c) => c.key))}
          referenceKey={reference?.variantId ?? ''}
          hidden={new Set()}
          title={`${s.name}: relative activity`}
          height={300}
        />
      </ReportSection>
      <ReportSection
        title="Profiles"
        description="Replicate means ± SD, the fitted curve with its 95 % band, apparent pKa values and the optimum with their intervals, and the half-activity window."
      >
        <ProfileCharts
          profiles={result.profiles}
          xLabel={xLabel}
          yLabel={yLabel}
          unit={result.units.activity}
          bootstrapCurrent={bootstrapCurrent}
        />
      </ReportSection>
      <ReportSection title="Fitted parameters">
        <ParameterTable
          profiles={result.profiles}
          activityUnit={result.units.activity}
          bootstrapCurrent={bootstrapCurrent}
        />
      </ReportSection>
      <ReportSection title="Plate QC">
        <QcSummary result={result} variantNames={variantNames} />
      </ReportSection>
      <ReportSection title="Exclusions" keep>
        <ExclusionsTable exclusions={a.exclusions} />
      </ReportSection>
      <ReportSection title="Review and approvals" keep>
        {history.isError ? (
          <p className="text-danger-600">{history.error.message}</p>
        ) : history.data ? (
          <ApprovalsTable events={history.data} />
        ) : (
          <Loading label="Loading the review history…" />
        )}
      </ReportSection>
      <ReportSection title="Provenance" keep>
        <ProvenanceList
          items={[
            { label: 'Engine version', value: result.engineVersion },
            { label: 'Analysis version', value: result.analysisVersion },
            {
              label: 'Input hash (SHA-256)',
              value: <span className="font-mono text-xs">{a.inputHash}</span>,
            },
            { label: 'Computed', value: formatDateTime(a.computedAt) },
            {
              label: 'Bootstrap',
              value: bootstrapCurrent
                ? `${a.bootstrap.resamples} resamples, ${formatDateTime(a.bootstrap.at)}`
                : 'not run for these inputs',
            },
            ...(a.frozen
              ? [
                  {
                    label: 'Stored result',
                    value: 'Approved: the stored result is shown as it was approved.',
                  },
                ]
              : []),
          ]}
          files={files}
          filesNote={
            readsLoading
              ? 'Loading the raw-file hashes…'
              : readsFailed
                ? 'The raw-file hashes could not be loaded.'
                : files.length === 0
                  ? 'No raw reader files.'
                  : undefined
          }
        />
      </ReportSection>
    </ReportPage>
  );
}

type PlateRef = { id: string; name: string };
type ReadRef = { fileId: string; fileName: string; sha256: string; uploadedBy: string; uploadedAt: string };

/** One row per raw file (a file with several blocks has several reads). */
function rawFiles(plates: PlateRef[], reads: (ReadRef[] | undefined)[]): RawFile[] {
  const seen = new Set<string>();
  const files: RawFile[] = [];
  plates.forEach((plate, i) => {
    for (const r of reads[i] ?? []) {
      if (seen.has(r.fileId)) continue;
      seen.add(r.fileId);
      files.push({
        name: r.fileName,
        plate: plate.name,
        sha256: r.sha256,
        uploadedBy: r.uploadedBy,
        uploadedAt: r.uploadedAt,
      });
    }
  });
  return files;
}
