export type OutboxListParams = { limit: number; offset: number };

export const outboxKeys = {
  all: ['outbox'] as const,
  list: (params: OutboxListParams) => [...outboxKeys.all, 'list', params] as const,
  detail: (id: string) => [...outboxKeys.all, 'detail', id] as const,
};
