// Who is signed in, from GET /api/me (401 means signed out), and the hooks that change it.
// The client only hides what a role cannot do; the server decides access on every route.
import { queryOptions, useMutation, useQuery, useQueryClient, type QueryClient } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { Navigate, Outlet, useLocation, useNavigate } from 'react-router';
import { can, type Permission } from '@shared/permissions';
import type { Me } from '@shared/schemas/api-types';
import type { SignInInput } from '@shared/schemas/auth';
import { NotAllowed } from '@/components/errors/not-allowed';
import { paths, type SignInState } from '@/config/paths';
import { ApiError, api, setCsrfToken } from './api-client';
import { meQueryKey, warmCache } from './query-client';

export async function getMe(): Promise<Me | null> {
  try {
    const me = await api.get<Me>('/me');
    setCsrfToken(me.csrfToken);
    return me;
  } catch (error) {
    if (error instanceof ApiError && error.status === 401) {
      setCsrfToken(null);
      return null;
    }
    throw error;
  }
}

export const meQueryOptions = () => queryOptions({ queryKey: meQueryKey, queryFn: getMe, staleTime: 60_000 });

/**
 * A route loader's cache warming, for signed-in users whose role may read the data: no request
 * is sent that the server would refuse (the screen itself shows sign-in or "not for your role").
 */
export async function warmCacheFor(
  queryClient: QueryClient,
  permission: Permission,
  ...loads: (() => Promise<unknown>)[]
): Promise<null> {
  const me = await queryClient.ensureQueryData(meQueryOptions()).catch(() => null);
  return can(me?.role, permission) ? warmCache(...loads) : null;
}

/** The signed-in user, or null when signed out. */
export function useUser() {
  return useQuery(meQueryOptions());
}

export function useCan(permission: Permission): boolean {
  const { data: me } = useUser();
  return can(me?.role, permission);
}

export function useSignIn(options: { onSuccess?: (me: Me) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: SignInInput) => api.post<Me>('/auth/sign-in', input),
    onSuccess: (me) => {
      setCsrfToken(me.csrfToken);
      queryClient.removeQueries({ predicate: (q) => q.queryKey[0] !== meQueryKey[0] });
      queryClient.setQueryData(meQueryKey, me);
      options.onSuccess?.(me);
    },
  });
}

/** Optional: what the sign-in page shows afterwards (e.g. "Account created" with the new e-mail). */
export type SignOutOptions = { state?: SignInState };

export function useSignOut() {
  const queryClient = useQueryClient();
  const navigate = useNavigate();
  const finish = async (options?: SignOutOptions) => {
    setCsrfToken(null);
    // Leave the protected page first, so it does not ask to come back here after the next sign-in.
    const state: SignInState = { ...options?.state, signedOut: true };
    await navigate(paths.signIn.href(), { replace: true, state });
    queryClient.removeQueries({ predicate: (q) => q.queryKey[0] !== meQueryKey[0] });
    queryClient.setQueryData(meQueryKey, null);
  };
  return useMutation({
    mutationFn: (_options?: SignOutOptions) => api.post<void>('/auth/sign-out'),
    onSuccess: (_data, options) => finish(options),
    // An already-ended session is signed out too.
    onError: (error, options) =>
      error instanceof ApiError && error.status === 401 ? finish(options) : undefined,
  });
}

export type RequireAuthProps = { permission?: Permission; children?: ReactNode };

/** Layout route: signed-out visitors go to the sign-in page, and come back here afterwards. */
export function RequireAuth({ permission, children }: RequireAuthProps) {
  const { data: me, isPending } = useUser();
  const location = useLocation();
  if (isPending) return null;
  if (!me) {
    return <Navigate to={paths.signIn.href(location.pathname + location.search)} replace />;
  }
  if (permission && !can(me.role, permission)) return <NotAllowed />;
  return children ?? <Outlet />;
}
