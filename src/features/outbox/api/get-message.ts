import { queryOptions, useQuery } from '@tanstack/react-query';
import type { MailMessage } from '@shared/schemas/api-types';
import { api } from '@/lib/api-client';
import { outboxKeys } from './keys';

export const getMessage = (id: string, signal?: AbortSignal) =>
  api.get<MailMessage>(`/outbox/${encodeURIComponent(id)}`, undefined, signal);

export const getMessageQueryOptions = (id: string) =>
  queryOptions({
    queryKey: outboxKeys.detail(id),
    queryFn: ({ signal }) => getMessage(id, signal),
    staleTime: Infinity,
  });

export function useMessage(id: string | undefined) {
  return useQuery({ ...getMessageQueryOptions(id ?? ''), enabled: Boolean(id) });
}
