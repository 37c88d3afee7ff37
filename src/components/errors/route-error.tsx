// The error boundary of the router: a calm message, what happened in a line, and a way back.
import { isRouteErrorResponse, Link, useRouteError } from 'react-router';
import { paths } from '@/config/paths';
import { ApiError } from '@/lib/api-client';

function describe(error: unknown): string {
  if (isRouteErrorResponse(error)) return `${error.status} ${error.statusText}`.trim();
  if (error instanceof ApiError) return error.message;
  if (
    error instanceof Error &&
    /dynamically imported module|Importing a module script failed/i.test(error.message)
  ) {
    return 'A newer version of Bellwether was installed while this page was open. Reload the page.';
  }
  return error instanceof Error ? error.message : 'An unexpected error.';
}

export function RouteError() {
  const error = useRouteError();
  return (
    <div className="mx-auto mt-16 max-w-xl rounded-md border border-line bg-surface px-7 py-6">
      <h1 className="text-xl">Something went wrong on this page</h1>
      <p className="mt-2 text-ink-muted">
        What was already saved is safe on the server. Reload the page, or go back to Home.
      </p>
      <p className="mt-3 rounded border border-line bg-canvas px-3 py-2 font-mono text-sm text-ink-muted">
        {describe(error)}
      </p>
      <div className="mt-5 flex gap-3">
        <button
          type="button"
          onClick={() => window.location.reload()}
          className="h-9 rounded border border-accent-700 bg-accent-700 px-3.5 font-semibold text-white hover:bg-accent-800"
        >
          Reload the page
        </button>
        <Link
          to={paths.home.href()}
          reloadDocument
          className="inline-flex h-9 items-center px-2 font-semibold text-accent-700 underline"
        >
          Back to Home
        </Link>
      </div>
    </div>
  );
}
