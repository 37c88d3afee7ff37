// Where a report's numbers come from: engine and analysis versions, the input hash, when computed,
// and the SHA-256 of every raw reader file the data were imported from.
import type { ReactNode } from 'react';
import { formatDateTime } from '@/lib/format';

export type RawFile = { name: string; plate: string; sha256: string; uploadedBy: string; uploadedAt: string };

export type ProvenanceListProps = {
  items: { label: string; value: ReactNode }[];
  files?: RawFile[];
  /** Shown instead of the file table when the hashes could not be loaded. */
  filesNote?: string;
};

export function ProvenanceList({ items, files, filesNote }: ProvenanceListProps) {
  return (
    <div className="space-y-2 text-sm">
      <dl className="grid grid-cols-[11rem_1fr] gap-x-3 gap-y-0.5">
        {items.map((i) => (
          <div key={i.label} className="contents">
            <dt className="text-ink-muted">{i.label}</dt>
            <dd className="break-all">{i.value}</dd>
          </div>
        ))}
      </dl>
      {filesNote && <p className="text-ink-muted">{filesNote}</p>}
      {files && files.length > 0 && (
        <table className="w-full border-collapse" aria-label="Raw reader files">
          <thead className="text-left text-ink-muted">
            <tr>
              <th className="border-b border-line py-1 pr-2 font-semibold">Raw file</th>
              <th className="border-b border-line py-1 pr-2 font-semibold">SHA-256</th>
              <th className="border-b border-line py-1 font-semibold">Uploaded</th>
            </tr>
          </thead>
          <tbody>
            {files.map((f) => (
              <tr
                key={`${f.plate}-${f.sha256}-${f.name}`}
                className="border-b border-line align-top last:border-b-0"
              >
                <td className="py-1 pr-2">
                  {f.name}
                  <span className="block text-xs text-ink-muted">{f.plate}</span>
                </td>
                <td className="py-1 pr-2 font-mono text-[9px] break-all">{f.sha256}</td>
                <td className="py-1">
                  {f.uploadedBy}, {formatDateTime(f.uploadedAt)}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </div>
  );
}
