// Where the numbers come from: engine and analysis versions, a short hash of every input, and when
// they were computed, so a result can be recomputed and compared later.
import type { StudyAnalysis } from '@shared/schemas/analysis';
import { formatDateTime } from '@/lib/format';

export type ProvenanceLineProps = { analysis: StudyAnalysis };

export function ProvenanceLine({ analysis }: ProvenanceLineProps) {
  const { result } = analysis;
  return (
    <p className="text-sm text-ink-muted" aria-label="Provenance">
      Fitting engine {result.engineVersion} · analysis {result.analysisVersion} · inputs{' '}
      <code title={`SHA-256 of every input: ${analysis.inputHash}`} className="font-mono text-xs">
        {analysis.inputHash.slice(0, 12)}
      </code>{' '}
      · computed {formatDateTime(analysis.computedAt)} on the server · settings version{' '}
      {analysis.settingsVersion}
    </p>
  );
}
