import { Notice } from '@/components/ui/notice';
import { SignedInSummary } from '@/features/home/components/signed-in-summary';
import { WhereToStart } from '@/features/home/components/where-to-start';
import { useUser } from '@/lib/auth';

export default function HomeRoute() {
  const { data: me } = useUser();
  if (!me) return null;
  return (
    <>
      <h1 className="text-2xl">Welcome, {me.name}</h1>
      <p className="mt-1 mb-5 text-ink-muted">{me.email}</p>
      <div className="grid grid-cols-[1fr_20rem] items-start gap-6">
        <section aria-labelledby="start-heading">
          <h2 id="start-heading" className="mb-2 text-lg">
            Where to start
          </h2>
          <WhereToStart role={me.role} />
          <Notice className="mt-4">
            This version of Bellwether holds accounts, teams, e-mail and the audit log. Enzymes and variants,
            assays, buffer design, plate maps, reader imports, fits and comparisons come in the next versions.
          </Notice>
        </section>
        <aside aria-label="Your account">
          <h2 className="mb-2 text-lg">You</h2>
          <SignedInSummary me={me} />
        </aside>
      </div>
    </>
  );
}
