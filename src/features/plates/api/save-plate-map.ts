import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { PlateMap } from '@shared/plate-map/schema';
import { request } from '@/lib/api-client';
import { plateKeys } from './keys';

export type MapSave = { plateId: string; version: number; map: PlateMap };
export type MapSaved = { id: string; version: number };

/** Saves with the version the editor started from; an older one is answered 409 stale_version. */
export const savePlateMap = ({ plateId, version, map }: MapSave) =>
  request<MapSaved>(`/plates/${encodeURIComponent(plateId)}/map`, { method: 'PUT', body: { version, map } });

export function useSavePlateMap(options: { onSuccess?: (saved: MapSaved) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: savePlateMap,
    onSuccess: async (saved) => {
      await queryClient.invalidateQueries({ queryKey: plateKeys.detail(saved.id) });
      void queryClient.invalidateQueries({ queryKey: [...plateKeys.all, 'list'] });
      options.onSuccess?.(saved);
    },
  });
}
