// The study page: its name and status above a tab bar (study-tabs.ts); each tab is a child route.
import type { QueryClient } from '@tanstack/react-query';
import { Link, NavLink, Outlet, useParams, type LoaderFunctionArgs } from 'react-router';
import { QueryError } from '@/components/ui/notice';
import { Loading } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { ReviewStrip } from '@/features/review/components/review-strip';
import { getStudyQueryOptions, useStudy } from '@/features/studies/api/get-study';
import { StudyStatusBadge } from '@/features/studies/components/study-status-badge';
import { warmCacheFor } from '@/lib/auth';
import { studyTabs } from './study-tabs';

export const clientLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) =>
    warmCacheFor(queryClient, 'records:read', () =>
      queryClient.ensureQueryData(getStudyQueryOptions(params.studyId ?? '')),
    );

export default function StudyLayoutRoute() {
  const { studyId = '' } = useParams();
  const study = useStudy(studyId);
  if (study.isPending) return <Loading label="Loading the study…" />;
  if (study.isError)
    return <QueryError error={study.error} what="this study" onRetry={() => void study.refetch()} />;
  const s = study.data;
  const base = paths.study.href(s.id);
  return (
    <>
      <p className="mb-1 text-sm print:hidden">
        <Link to={paths.studies.href()} className="text-accent-700 hover:underline">
          Studies
        </Link>
      </p>
      <div className="mb-3 flex items-center gap-3">
        <h1 className="text-2xl leading-tight">{s.name}</h1>
        <StudyStatusBadge status={s.status} />
      </div>
      <nav aria-label="Study" className="mb-5 border-b border-line print:hidden">
        <ul className="flex gap-1">
          {studyTabs.map((tab) => (
            <li key={tab.label}>
              <NavLink
                to={tab.to ? `${base}/${tab.to}` : base}
                end={tab.end}
                className={({ isActive }) =>
                  `-mb-px inline-block border-b-2 px-3 py-1.5 font-semibold ${
                    isActive
                      ? 'border-accent-700 text-accent-800'
                      : 'border-transparent text-ink-muted hover:text-ink'
                  }`
                }
              >
                {tab.label}
              </NavLink>
            </li>
          ))}
        </ul>
      </nav>
      <ReviewStrip studyId={s.id} status={s.status} reviewHref={paths.studyReview.href(s.id)} />
      <Outlet />
    </>
  );
}
