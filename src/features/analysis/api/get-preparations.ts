import { queryOptions, useQuery } from '@tanstack/react-query';
import type { EnzymeDetail } from '@shared/schemas/records-types';
import { api } from '@/lib/api-client';
import { analysisKeys } from './keys';

/** The preparations of each variant of an enzyme (protein concentration for specific activity). */
export const getPreparations = async (enzymeId: string, signal?: AbortSignal) => {
  const enzyme = await api.get<EnzymeDetail>(`/enzymes/${encodeURIComponent(enzymeId)}`, undefined, signal);
  return Object.fromEntries(enzyme.variants.map((v) => [v.id, v.preparations]));
};

export const getPreparationsQueryOptions = (enzymeId: string) =>
  queryOptions({
    queryKey: analysisKeys.preparations(enzymeId),
    queryFn: ({ signal }) => getPreparations(enzymeId, signal),
  });

export function usePreparations(enzymeId: string | null) {
  return useQuery({ ...getPreparationsQueryOptions(enzymeId ?? ''), enabled: Boolean(enzymeId) });
}
