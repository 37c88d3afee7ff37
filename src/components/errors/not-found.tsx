import { Link, useLocation } from 'react-router';
import { paths } from '@/config/paths';

export function NotFound() {
  const location = useLocation();
  return (
    <div className="mx-auto max-w-xl py-16 text-center">
      <p className="text-sm font-semibold tracking-wide text-ink-faint uppercase">Not found</p>
      <h1 className="mt-1 text-xl">There is no page at this address</h1>
      <p className="mt-2 text-ink-muted">
        <code className="rounded bg-surface px-1.5 py-0.5 font-mono text-sm">{location.pathname}</code> does
        not exist in Bellwether. The link may be mistyped or out of date.
      </p>
      <Link to={paths.home.href()} className="mt-4 inline-block font-semibold text-accent-700 underline">
        Back to Home
      </Link>
    </div>
  );
}
