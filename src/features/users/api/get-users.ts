import { queryOptions, useQuery } from '@tanstack/react-query';
import type { UserSummary } from '@shared/schemas/api-types';
import { api } from '@/lib/api-client';
import { userKeys } from './keys';

export const getUsers = (signal?: AbortSignal) => api.get<UserSummary[]>('/users', undefined, signal);

export const getUsersQueryOptions = () =>
  queryOptions({ queryKey: userKeys.list(), queryFn: ({ signal }) => getUsers(signal) });

/** All accounts (admins only: `users:read`). Pass `enabled: false` for roles that cannot read them. */
export function useUsers(options: { enabled?: boolean } = {}) {
  return useQuery({ ...getUsersQueryOptions(), enabled: options.enabled ?? true });
}
