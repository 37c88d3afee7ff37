// The comparison on paper: one table of the values with their 95 % intervals, one of the
// differences to the reference with theirs (clear differences in bold and framed), so all seven
// quantities fit the width of an A4 page.
import { comparisonMetrics, type ComparisonResult } from '@shared/comparison/compare';
import { Badge } from '@/components/ui/badge';
import type { ProfileStyle } from '../utils/colors';
import { differenceHeaders, metricHeaders } from './comparison-columns';
import { DifferenceCell, ValueCell } from './metric-cells';
import { LineSwatch } from './line-swatch';

export type ComparisonPrintTablesProps = {
  result: ComparisonResult;
  units: Record<string, string>;
  styles: Record<string, ProfileStyle>;
};

const th = 'border-b border-line py-1 pr-1.5 font-semibold align-bottom';

function ProfileName({
  row,
  style,
  showStudy,
}: {
  row: ComparisonResult['rows'][number];
  style?: ProfileStyle;
  showStudy: boolean;
}) {
  return (
    <td className="py-1 pr-1.5 align-top">
      <span className="flex items-center gap-1 font-semibold">
        <LineSwatch style={style} />
        {row.variantName}
      </span>
      {showStudy && <span className="block text-xs text-ink-muted">{row.studyName}</span>}
      <span className="flex flex-wrap gap-1">
        {row.isReference && <Badge tone="accent">reference</Badge>}
        {!row.approved && <Badge tone="warning">not approved</Badge>}
      </span>
    </td>
  );
}

export function ComparisonPrintTables({ result, units, styles }: ComparisonPrintTablesProps) {
  // One study: it is named in the summary above, not on every row.
  const showStudy = new Set(result.rows.map((r) => r.studyName)).size > 1;
  return (
    <div className="space-y-4 text-sm">
      <table className="w-full border-collapse" aria-label="Values with their 95 % intervals">
        <thead className="text-left text-ink-muted">
          <tr>
            <th className={th}>Profile</th>
            {comparisonMetrics.map((m) => (
              <th key={m} className={`${th} text-right`}>
                {metricHeaders[m]}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {result.rows.map((r) => (
            <tr key={r.key} className="border-b border-line last:border-b-0">
              <ProfileName row={r} style={styles[r.key]} showStudy={showStudy} />
              {comparisonMetrics.map((m) => (
                <td key={m} className="num py-1 pr-1.5 align-top">
                  <ValueCell
                    metric={m}
                    value={r.metrics[m]}
                    unit={m === 'maxActivity' ? units[r.key] : undefined}
                  />
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
      <table
        className="w-full border-collapse"
        aria-label="Differences to the reference with their 95 % intervals"
      >
        <thead className="text-left text-ink-muted">
          <tr>
            <th className={th}>Profile</th>
            {comparisonMetrics.map((m) => (
              <th key={m} className={`${th} text-right`}>
                {differenceHeaders[m]}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {result.rows.map((r) => (
            <tr key={r.key} className="border-b border-line last:border-b-0">
              <ProfileName row={r} style={styles[r.key]} showStudy={showStudy} />
              {comparisonMetrics.map((m) => (
                <td key={m} className="num py-1 pr-1.5 align-top">
                  <DifferenceCell metric={m} difference={r.differences[m]} isReference={r.isReference} />
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
      {result.rows.some((r) => r.comparability.length > 0 || r.error) && (
        <ul className="space-y-0.5">
          {result.rows
            .filter((r) => r.comparability.length > 0 || r.error)
            .map((r) => (
              <li key={r.key} className="text-warn-800">
                <span className="font-semibold">
                  {r.variantName} ({r.studyName}):
                </span>{' '}
                {r.comparability.length > 0 && `not directly comparable. ${r.comparability.join(' ')}`}{' '}
                {r.error}
              </li>
            ))}
        </ul>
      )}
      <p className="text-xs text-ink-muted">
        Under each value: its 95 % t interval. {result.method} Framed and bold: a clear difference. Maximum
        activity is compared as a ratio to the reference’s.
      </p>
    </div>
  );
}
