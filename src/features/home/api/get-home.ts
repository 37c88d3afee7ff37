import { queryOptions, useQuery } from '@tanstack/react-query';
import type { HomeView } from '@shared/schemas/home';
import { api } from '@/lib/api-client';

export const homeKeys = { all: ['home'] as const };

/** What the signed-in person should look at first: drafts, reviews, approvals, uploads, with counts. */
export const getHome = (signal?: AbortSignal) => api.get<HomeView>('/home', undefined, signal);

export const getHomeQueryOptions = () =>
  queryOptions({ queryKey: homeKeys.all, queryFn: ({ signal }) => getHome(signal) });

export function useHome() {
  return useQuery(getHomeQueryOptions());
}
