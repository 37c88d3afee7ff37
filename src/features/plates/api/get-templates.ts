import { queryOptions, useQuery } from '@tanstack/react-query';
import type { PlateTemplate } from '@shared/schemas/plates-types';
import { api } from '@/lib/api-client';
import { plateKeys } from './keys';

export const getTemplates = (teamId: string, format: number, signal?: AbortSignal) =>
  api.get<PlateTemplate[]>('/plate-templates', { teamId, format }, signal);

export const getTemplatesQueryOptions = (teamId: string, format: number) =>
  queryOptions({
    queryKey: plateKeys.templates(teamId, format),
    queryFn: ({ signal }) => getTemplates(teamId, format, signal),
  });

export function useTemplates(teamId: string, format: number, options: { enabled?: boolean } = {}) {
  return useQuery({ ...getTemplatesQueryOptions(teamId, format), enabled: options.enabled ?? true });
}
