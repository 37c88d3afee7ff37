import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { MailSummary, Page } from '@shared/schemas/api-types';
import { api } from '@/lib/api-client';
import { outboxKeys, type OutboxListParams } from './keys';

/** Messages the local mail server received, newest first. */
export const getMessages = (params: OutboxListParams, signal?: AbortSignal) =>
  api.get<Page<MailSummary>>('/outbox', params, signal);

export const getMessagesQueryOptions = (params: OutboxListParams) =>
  queryOptions({
    queryKey: outboxKeys.list(params),
    queryFn: ({ signal }) => getMessages(params, signal),
    // New mail arrives from other people's actions: keep the list fresh while it is open.
    staleTime: 0,
    refetchInterval: 15_000,
    placeholderData: keepPreviousData,
  });

export function useMessages(params: OutboxListParams) {
  return useQuery(getMessagesQueryOptions(params));
}
