// The latest reader files uploaded in the user's teams, with their plate and study.
import { Link } from 'react-router';
import type { RecentUpload } from '@shared/schemas/home';
import { paths } from '@/config/paths';
import { formatDateTime } from '@/lib/format';

export type UploadListProps = { uploads: RecentUpload[]; total: number };

export function UploadList({ uploads, total }: UploadListProps) {
  return (
    <section aria-labelledby="home-uploads" className="rounded border border-line bg-surface">
      <h2
        id="home-uploads"
        className="flex items-center justify-between border-b border-line px-4 py-2 text-base"
      >
        Recent uploads
        <span className="rounded-full bg-canvas px-2 text-sm text-ink-muted tabular-nums">{total}</span>
      </h2>
      {uploads.length === 0 ? (
        <p className="px-4 py-3 text-ink-muted">No reader files uploaded yet.</p>
      ) : (
        <ul className="divide-y divide-line">
          {uploads.map((u) => (
            <li key={u.id} className="px-4 py-2">
              <Link
                to={paths.plate.href(u.studyId, u.plateId, 'reads')}
                className="font-semibold break-all text-accent-700 hover:underline"
              >
                {u.fileName}
              </Link>
              <p className="text-sm text-ink-muted">
                {u.plateName} · {u.studyName}
              </p>
              <p className="text-sm text-ink-muted">
                {u.by}, {formatDateTime(u.uploadedAt)}
              </p>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
