// The routes. A root layout (header + navigation) holds the signed-out pages, the protected layout
// (derived from useUser) and the not-found page. Each screen is a thin, lazily loaded route module
// whose optional `clientLoader` only warms the query cache.
import type { QueryClient } from '@tanstack/react-query';
import type { ComponentType } from 'react';
import { createBrowserRouter, type LoaderFunctionArgs } from 'react-router';
import { RouterProvider } from 'react-router/dom';
import { RouteError } from '@/components/errors/route-error';
import { AppLayout } from '@/components/layouts/app-layout';
import { Loading } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { meQueryOptions, RequireAuth } from '@/lib/auth';
import { queryClient } from '@/lib/query-client';

type RouteModule = {
  default: ComponentType;
  clientLoader?: (queryClient: QueryClient) => (args: LoaderFunctionArgs) => Promise<unknown>;
};

/** Turns a route module into what React Router's `lazy` expects. */
const load = (importModule: () => Promise<RouteModule>) => async () => {
  const m = await importModule();
  return { Component: m.default, loader: m.clientLoader?.(queryClient) };
};

const rel = (path: string) => path.replace(/^\//, '');

export const router = createBrowserRouter([
  {
    path: paths.home.path,
    element: <AppLayout />,
    errorElement: <RouteError />,
    hydrateFallbackElement: <Loading label="Opening Bellwether…" />,
    // Who is signed in decides the header and the navigation: know it before the first paint.
    loader: () => queryClient.ensureQueryData(meQueryOptions()),
    children: [
      { path: rel(paths.signIn.path), lazy: load(() => import('./routes/sign-in')) },
      { path: rel(paths.resetRequest.path), lazy: load(() => import('./routes/reset-password-request')) },
      { path: rel(paths.resetPassword.path), lazy: load(() => import('./routes/reset-password')) },
      { path: rel(paths.invitation.path), lazy: load(() => import('./routes/invitation')) },
      {
        element: <RequireAuth />,
        children: [
          { index: true, lazy: load(() => import('./routes/home')) },
          { path: rel(paths.account.path), lazy: load(() => import('./routes/account')) },
          { path: rel(paths.teams.path), lazy: load(() => import('./routes/teams')) },
          { path: rel(paths.team.path), lazy: load(() => import('./routes/teams')) },
          // Records (issue 4): everyone signed in reads them; the screens hide what a role cannot do.
          { path: rel(paths.studies.path), lazy: load(() => import('./routes/studies/list')) },
          {
            path: rel(paths.study.path),
            lazy: load(() => import('./routes/studies/study-layout')),
            children: [
              { index: true, lazy: load(() => import('./routes/studies/overview')) },
              { path: 'buffers', lazy: load(() => import('./routes/studies/buffers')) },
              // Plates (issue 5): the list, one plate (map editor and reads), the import of reader files.
              { path: 'plates', lazy: load(() => import('./routes/studies/plates')) },
              { path: 'plates/:plateId', lazy: load(() => import('./routes/studies/plates-detail')) },
              { path: 'plates/:plateId/import', lazy: load(() => import('./routes/studies/plates-import')) },
              // Analysis and review (issue 6).
              { path: 'analysis', lazy: load(() => import('./routes/studies/analysis')) },
              { path: 'review', lazy: load(() => import('./routes/studies/review')) },
            ],
          },
          { path: rel(paths.enzymes.path), lazy: load(() => import('./routes/enzymes/list')) },
          { path: rel(paths.enzyme.path), lazy: load(() => import('./routes/enzymes/detail')) },
          { path: rel(paths.assays.path), lazy: load(() => import('./routes/assays/list')) },
          { path: rel(paths.assay.path), lazy: load(() => import('./routes/assays/detail')) },
          { path: rel(paths.buffers.path), lazy: load(() => import('./routes/buffers/list')) },
          { path: rel(paths.buffer.path), lazy: load(() => import('./routes/buffers/detail')) },
          { path: rel(paths.bufferSeriesList.path), lazy: load(() => import('./routes/buffer-series/list')) },
          {
            path: rel(paths.bufferSeriesNew.path),
            lazy: load(() => import('./routes/buffer-series/designer')),
          },
          { path: rel(paths.bufferSeries.path), lazy: load(() => import('./routes/buffer-series/designer')) },
          // Comparisons and printable reports (issue 7): read by every role; reports outside the study tabs.
          { path: rel(paths.comparisons.path), lazy: load(() => import('./routes/comparisons/list')) },
          { path: rel(paths.comparison.path), lazy: load(() => import('./routes/comparisons/detail')) },
          { path: rel(paths.comparisonReport.path), lazy: load(() => import('./routes/comparisons/report')) },
          { path: rel(paths.studyReport.path), lazy: load(() => import('./routes/studies/report')) },
        ],
      },
      {
        element: <RequireAuth permission="records:write" />,
        children: [
          { path: rel(paths.comparisonNew.path), lazy: load(() => import('./routes/comparisons/new')) },
          { path: rel(paths.comparisonEdit.path), lazy: load(() => import('./routes/comparisons/edit')) },
          { path: rel(paths.studyNew.path), lazy: load(() => import('./routes/studies/new')) },
          { path: rel(paths.assayNew.path), lazy: load(() => import('./routes/assays/edit')) },
          { path: rel(paths.assayEdit.path), lazy: load(() => import('./routes/assays/edit')) },
        ],
      },
      {
        element: <RequireAuth permission="buffers:manage" />,
        children: [
          { path: rel(paths.bufferNew.path), lazy: load(() => import('./routes/buffers/edit')) },
          { path: rel(paths.bufferEdit.path), lazy: load(() => import('./routes/buffers/edit')) },
        ],
      },
      {
        element: <RequireAuth permission="users:read" />,
        children: [{ path: rel(paths.people.path), lazy: load(() => import('./routes/admin/people')) }],
      },
      {
        element: <RequireAuth permission="outbox:read" />,
        children: [
          { path: rel(paths.outbox.path), lazy: load(() => import('./routes/admin/outbox')) },
          { path: rel(paths.outboxMessage.path), lazy: load(() => import('./routes/admin/outbox')) },
        ],
      },
      {
        element: <RequireAuth permission="audit:read" />,
        children: [{ path: rel(paths.audit.path), lazy: load(() => import('./routes/admin/audit')) }],
      },
      { path: '*', lazy: load(() => import('./routes/not-found')) },
    ],
  },
]);

export function AppRouter() {
  return <RouterProvider router={router} />;
}
