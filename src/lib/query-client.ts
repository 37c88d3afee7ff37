// The one QueryClient. Client errors (4xx) are answers, not glitches: they are not retried.
// Any 401 means the session ended (idle expiry, deactivation, reset elsewhere): the signed-in
// user is fetched again, which signs the screen out and sends it to the sign-in page.
import { MutationCache, QueryCache, QueryClient, type QueryKey } from '@tanstack/react-query';
import { ApiError } from './api-client';

export const meQueryKey = ['me'] as const;

function isMe(key: QueryKey) {
  return key[0] === meQueryKey[0];
}

function onError(error: Error, key?: QueryKey) {
  const signedIn = Boolean(queryClient.getQueryData(meQueryKey));
  if (signedIn && error instanceof ApiError && error.status === 401 && !(key && isMe(key))) {
    void queryClient.invalidateQueries({ queryKey: meQueryKey });
  }
}

export const queryClient = new QueryClient({
  queryCache: new QueryCache({ onError: (error, query) => onError(error, query.queryKey) }),
  mutationCache: new MutationCache({ onError: (error) => onError(error) }),
  defaultOptions: {
    queries: {
      staleTime: 30_000,
      refetchOnWindowFocus: true,
      retry: (failures, error) =>
        !(error instanceof ApiError && error.status > 0 && error.status < 500) && failures < 2,
    },
    mutations: { retry: false },
  },
});

/**
 * What a route loader does: warm the cache so the screen opens with its data. A failure is not
 * thrown here; the screen's own query shows it where it belongs (with a way to try again).
 */
export async function warmCache(...loads: (() => Promise<unknown>)[]): Promise<null> {
  await Promise.allSettled(loads.map((load) => load()));
  return null;
}
