// One key factory for comparisons: the profiles that may be compared, previews of an unsaved
// comparison, the saved list and one saved comparison.
import type { ComparisonInput } from '@shared/schemas/comparisons';

export type ProfileFilter = { teamId?: string; includeUnapproved: boolean };

export const comparisonKeys = {
  all: ['comparisons'] as const,
  profiles: (filter: ProfileFilter) => [...comparisonKeys.all, 'profiles', filter] as const,
  preview: (input: ComparisonInput) => [...comparisonKeys.all, 'preview', input] as const,
  lists: () => [...comparisonKeys.all, 'list'] as const,
  list: (teamId?: string) => [...comparisonKeys.lists(), { teamId }] as const,
  detail: (id: string) => [...comparisonKeys.all, 'detail', id] as const,
};
