// A computed comparison on screen: the overlaid curves, the table, the global fit (when asked
// for) and where the numbers come from. Used by the builder's live preview and the saved page.
import { useMemo, useState } from 'react';
import type { ComparisonView } from '@shared/schemas/comparisons';
import { Notice } from '@/components/ui/notice';
import { curveLabels, profileStyles } from '../utils/colors';
import { ComparisonChart } from './comparison-chart';
import { ComparisonTable } from './comparison-table';
import { GlobalFitResult } from './global-fit-result';
import { ProvenanceTable } from './provenance-table';

export type ComparisonPanelProps = { view: ComparisonView };

export function ComparisonPanel({ view }: ComparisonPanelProps) {
  // Colours follow the order of the profiles; a new answer with the same profiles keeps them.
  const keyList = view.curves.map((c) => c.key).join('|');
  const styles = useMemo(() => profileStyles(keyList.split('|')), [keyList]);
  const [hidden, setHidden] = useState<Set<string>>(() => new Set());
  const toggle = (key: string) =>
    setHidden((h) => {
      const next = new Set(h);
      if (next.has(key)) next.delete(key);
      else next.add(key);
      return next;
    });
  const labels = curveLabels(view.result.rows);
  const curves = view.curves.map((c) => ({ ...c, label: labels[c.key] ?? c.label }));
  const unapproved = view.result.rows.filter((r) => !r.approved);
  const notComparable = view.result.rows.filter((r) => r.comparability.length > 0);
  return (
    <div className="space-y-5">
      {unapproved.length > 0 && (
        <Notice tone="warning" title="Includes studies not yet approved">
          {unapproved.map((r) => `${r.variantName} (${r.studyName})`).join(', ')}: their fits may still
          change.
        </Notice>
      )}
      {notComparable.length > 0 && (
        <Notice tone="warning" title="Not directly comparable">
          {notComparable.length === 1 ? 'One profile was' : `${notComparable.length} profiles were`} measured
          differently from the reference; the table gives the reasons.
        </Notice>
      )}
      <ComparisonChart
        curves={curves}
        styles={styles}
        referenceKey={view.result.referenceKey}
        hidden={hidden}
        onToggle={toggle}
      />
      <ComparisonTable result={view.result} units={view.units} styles={styles} />
      {view.globalFit && <GlobalFitResult globalFit={view.globalFit} />}
      <ProvenanceTable view={view} />
    </div>
  );
}
