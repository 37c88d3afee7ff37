// The study at a glance: status, enzyme, variants (reference marked), assay, buffer series (a slot
// the route fills from the buffer-series feature), owner and notes.
import type { ReactNode } from 'react';
import { Link } from 'react-router';
import type { StudyDetail } from '@shared/schemas/records-types';
import { Badge } from '@/components/ui/badge';
import { paths } from '@/config/paths';
import { formatDateTime } from '@/lib/format';
import { StudyStatusBadge } from './study-status-badge';

export type StudyOverviewProps = { study: StudyDetail; bufferSeries: ReactNode };

function Row({ label, children }: { label: string; children: ReactNode }) {
  return (
    <>
      <dt className="text-ink-muted">{label}</dt>
      <dd>{children}</dd>
    </>
  );
}

const link = 'text-accent-700 hover:underline';

export function StudyOverview({ study: s, bufferSeries }: StudyOverviewProps) {
  return (
    <div className="grid grid-cols-[1fr_22rem] items-start gap-6">
      <div className="space-y-5">
        <dl className="grid grid-cols-[9rem_1fr] gap-x-4 gap-y-1.5">
          <Row label="Status">
            <StudyStatusBadge status={s.status} />
          </Row>
          <Row label="Enzyme">
            <Link to={paths.enzyme.href(s.enzymeId)} className={link}>
              {s.enzymeName}
            </Link>
          </Row>
          <Row label="Assay">
            <Link to={paths.assay.href(s.assayId)} className={link}>
              {s.assayName}
            </Link>
          </Row>
          <Row label="Owner">{s.ownerName}</Row>
          <Row label="Team">{s.teamName}</Row>
          <Row label="Updated">
            <span className="tabular-nums">{formatDateTime(s.updatedAt)}</span>
          </Row>
        </dl>
        <section aria-labelledby="study-variants">
          <h2 id="study-variants" className="mb-1 text-lg">
            Variants ({s.variants.length})
          </h2>
          <table
            aria-label="Variants in this study"
            className="w-full border-collapse rounded border border-line bg-surface"
          >
            <thead className="bg-canvas text-left text-sm text-ink-muted">
              <tr>
                <th scope="col" className="border-b border-line px-3 py-1 font-semibold">
                  Variant
                </th>
                <th scope="col" className="border-b border-line px-3 py-1 font-semibold">
                  Mutations
                </th>
                <th scope="col" className="border-b border-line px-3 py-1 font-semibold">
                  Role
                </th>
              </tr>
            </thead>
            <tbody>
              {s.variants.map((v) => (
                <tr key={v.id} className="border-b border-line last:border-b-0">
                  <td className="px-3 py-1 font-semibold">{v.name}</td>
                  <td className="px-3 py-1 font-mono text-sm">{v.mutations || '—'}</td>
                  <td className="flex gap-1 px-3 py-1">
                    {v.id === s.referenceVariantId && <Badge tone="accent">Reference</Badge>}
                    {v.isParent && <Badge>Parent</Badge>}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </section>
        <section aria-labelledby="study-notes">
          <h2 id="study-notes" className="mb-1 text-lg">
            Notes
          </h2>
          <p className="max-w-3xl whitespace-pre-line text-ink">
            {s.notes || <span className="text-ink-muted">None.</span>}
          </p>
        </section>
      </div>
      <aside aria-labelledby="study-series" className="rounded border border-line bg-surface p-3">
        <h2 id="study-series" className="mb-1 text-lg">
          Buffer series
        </h2>
        {bufferSeries}
      </aside>
    </div>
  );
}
