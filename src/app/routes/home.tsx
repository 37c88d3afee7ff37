// The home page per role (GET /api/home): counts, then what to look at first — studies awaiting my
// review (leads, admins), drafts of mine (everyone who writes), recently approved in my teams and
// recent uploads. While the teams hold no study yet, the first steps of the role take their place.
import type { QueryClient } from '@tanstack/react-query';
import { can, roleLabels } from '@shared/permissions';
import { QueryError } from '@/components/ui/notice';
import { Loading } from '@/components/ui/spinner';
import { getHomeQueryOptions, useHome } from '@/features/home/api/get-home';
import { HomeCounts } from '@/features/home/components/home-counts';
import { SignedInSummary } from '@/features/home/components/signed-in-summary';
import { StudyList } from '@/features/home/components/study-list';
import { UploadList } from '@/features/home/components/upload-list';
import { WhereToStart } from '@/features/home/components/where-to-start';
import { whereToStart } from '@/features/home/utils/where-to-start';
import { useUser, warmCacheFor } from '@/lib/auth';

export const clientLoader = (queryClient: QueryClient) => () =>
  warmCacheFor(queryClient, 'records:read', () => queryClient.ensureQueryData(getHomeQueryOptions()));

export default function HomeRoute() {
  const { data: me } = useUser();
  const home = useHome();
  if (!me) return null;
  const writes = can(me.role, 'records:write');
  const reviews = can(me.role, 'studies:review');
  const inTeam = me.teams.length > 0 || me.role === 'admin';
  const steps = whereToStart(me.role, inTeam);
  const heading = (
    <>
      <h1 className="text-2xl">Welcome, {me.name}</h1>
      <p className="mt-1 mb-5 text-ink-muted">
        {roleLabels[me.role]}
        {me.teams.length > 0 && ` · ${me.teams.map((t) => t.name).join(', ')}`}
      </p>
    </>
  );
  if (home.isPending)
    return (
      <>
        {heading}
        <Loading label="Loading your overview…" />
      </>
    );
  if (home.isError)
    return (
      <>
        {heading}
        <QueryError error={home.error} what="your overview" onRetry={() => void home.refetch()} />
      </>
    );
  const h = home.data;
  const empty = h.counts.studies === 0;
  return (
    <>
      {heading}
      {empty ? (
        <div className="grid grid-cols-[1fr_20rem] items-start gap-6">
          <section aria-labelledby="start-heading">
            <h2 id="start-heading" className="mb-1 text-lg">
              Where to start
            </h2>
            <p className="mb-3 text-ink-muted">
              {!inTeam
                ? 'You are not in a team yet.'
                : me.role === 'viewer'
                  ? 'Your teams hold no study yet. When the scientists create studies, they appear here.'
                  : 'Your teams hold no study yet. A study needs an enzyme with its variants, an assay and a buffer series: in this order.'}
            </p>
            <WhereToStart steps={steps} />
          </section>
          <aside aria-label="Your account">
            <h2 className="mb-2 text-lg">You</h2>
            <SignedInSummary me={me} />
          </aside>
        </div>
      ) : (
        <>
          <HomeCounts
            counts={h.counts}
            showDrafts={writes}
            showReview={reviews}
            allTeams={me.role === 'admin'}
          />
          <div className="grid grid-cols-[1fr_22rem] items-start gap-6">
            <div className="space-y-5">
              {reviews && (
                <StudyList
                  id="home-review"
                  title="Awaiting my review"
                  count={h.counts.awaitingReview}
                  studies={h.awaitingReview}
                  empty="Nothing is waiting for your review."
                />
              )}
              {writes && (
                <StudyList
                  id="home-drafts"
                  title="Drafts of mine"
                  count={h.counts.myDrafts}
                  studies={h.myDrafts}
                  showOwner={false}
                  empty="No drafts: every study of yours is in review or approved."
                />
              )}
              <StudyList
                id="home-approved"
                title={me.role === 'admin' ? 'Recently approved' : 'Recently approved in my teams'}
                count={h.counts.approved}
                studies={h.recentlyApproved}
                empty="No study approved yet."
              />
            </div>
            <div className="space-y-5">
              <UploadList uploads={h.recentUploads.slice(0, 5)} total={h.counts.uploads} />
              <section aria-labelledby="next-heading">
                <h2 id="next-heading" className="mb-2 text-base">
                  Next steps
                </h2>
                <WhereToStart steps={steps.slice(0, 3)} compact />
              </section>
            </div>
          </div>
        </>
      )}
    </>
  );
}
