import type { SeriesRequest } from '@shared/schemas/buffer-series';

export const seriesKeys = {
  all: ['buffer-series'] as const,
  lists: () => [...seriesKeys.all, 'list'] as const,
  list: (filters: { teamId?: string } = {}) => [...seriesKeys.lists(), filters] as const,
  detail: (id: string) => [...seriesKeys.all, 'detail', id] as const,
  design: (request: SeriesRequest) => [...seriesKeys.all, 'design', request] as const,
};
