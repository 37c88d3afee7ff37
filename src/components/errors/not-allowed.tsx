import { Link } from 'react-router';
import { paths } from '@/config/paths';

/** Shown when a signed-in role opens a page it cannot use (the server would refuse it anyway). */
export function NotAllowed() {
  return (
    <div className="mx-auto max-w-xl py-16 text-center">
      <h1 className="text-xl">This page is not open to your role</h1>
      <p className="mt-2 text-ink-muted">
        The navigation above shows what you can open. If your work needs this page, ask an admin to change
        your role.
      </p>
      <Link to={paths.home.href()} className="mt-4 inline-block text-accent-700 underline">
        Back to Home
      </Link>
    </div>
  );
}
