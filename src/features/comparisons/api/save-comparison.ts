import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ComparisonInput, SavedComparison } from '@shared/schemas/comparisons';
import { api } from '@/lib/api-client';
import { comparisonKeys } from './keys';

export type ComparisonSave = ComparisonInput & { name: string; notes: string };

export const saveComparison = (input: ComparisonSave) => api.post<SavedComparison>('/comparisons', input);

export function useSaveComparison(options: { onSuccess?: (saved: SavedComparison) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: saveComparison,
    onSuccess: async (saved) => {
      await queryClient.invalidateQueries({ queryKey: comparisonKeys.lists() });
      options.onSuccess?.(saved);
    },
  });
}
