import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SeriesRequest } from '@shared/schemas/buffer-series';
import { api } from '@/lib/api-client';
import { seriesKeys } from './keys';

export type SeriesSave = { teamId: string; name: string; input: SeriesRequest; studyId: string | null };
export type SeriesSaved = { id: string; teamId: string; name: string; version: number };

export const saveSeries = (input: SeriesSave) => api.post<SeriesSaved>('/buffer-series', input);

/** Saves a new series (optionally attached to a study); studies are refreshed by the caller. */
export function useSaveSeries(options: { onSuccess?: (saved: SeriesSaved, input: SeriesSave) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: saveSeries,
    onSuccess: async (saved, input) => {
      await queryClient.invalidateQueries({ queryKey: seriesKeys.lists() });
      options.onSuccess?.(saved, input);
    },
  });
}
