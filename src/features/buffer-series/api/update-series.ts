import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SeriesRequest } from '@shared/schemas/buffer-series';
import { api } from '@/lib/api-client';
import { seriesKeys } from './keys';
import type { SeriesSaved } from './save-series';

/** `version` is the one the change was made from: the server answers 409 when it moved on. */
export type SeriesChange = { name?: string; input?: SeriesRequest; version: number };

export const updateSeries = (id: string, change: SeriesChange) =>
  api.patch<SeriesSaved>(`/buffer-series/${encodeURIComponent(id)}`, change);

export function useUpdateSeries(options: { onSuccess?: (saved: SeriesSaved) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, change }: { id: string; change: SeriesChange }) => updateSeries(id, change),
    onSuccess: async (saved) => {
      // Not the design previews: they depend on the request only.
      await queryClient.invalidateQueries({ queryKey: seriesKeys.lists() });
      await queryClient.invalidateQueries({ queryKey: seriesKeys.detail(saved.id) });
      options.onSuccess?.(saved);
    },
  });
}
