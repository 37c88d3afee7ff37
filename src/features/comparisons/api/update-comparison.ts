import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SavedComparison } from '@shared/schemas/comparisons';
import { request } from '@/lib/api-client';
import { comparisonKeys } from './keys';
import type { ComparisonSave } from './save-comparison';

/** The whole comparison again, with the version it was read at (a stale one gets 409). */
export type ComparisonUpdate = ComparisonSave & { version: number };

export const updateComparison = (id: string, change: ComparisonUpdate) =>
  request<SavedComparison>(`/comparisons/${encodeURIComponent(id)}`, { method: 'PUT', body: change });

export function useUpdateComparison(options: { onSuccess?: (saved: SavedComparison) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, change }: { id: string; change: ComparisonUpdate }) => updateComparison(id, change),
    onSuccess: async (saved) => {
      await queryClient.invalidateQueries({ queryKey: comparisonKeys.lists() });
      await queryClient.invalidateQueries({ queryKey: comparisonKeys.detail(saved.id) });
      options.onSuccess?.(saved);
    },
  });
}
