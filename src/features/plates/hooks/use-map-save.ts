// Saving the map with the version the editor started from. A 409 (someone saved since) opens the
// reload offer; reloading can first put this editor's map in the clipboard, to paste back.
import { useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import type { PlateFormat } from '@shared/plate/geometry';
import { useToast } from '@/components/ui/toast';
import { ApiError } from '@/lib/api-client';
import { getPlateQueryOptions } from '../api/get-plate';
import { useSavePlateMap } from '../api/save-plate-map';
import { clipText, copyWholeMap, rememberClip } from '../utils/clipboard';
import type { useMapHistory } from './use-map-history';

type History = ReturnType<typeof useMapHistory>;

export function useMapSave(plateId: string, format: PlateFormat, history: History, readOnly: boolean) {
  const toast = useToast();
  const queryClient = useQueryClient();
  const mutation = useSavePlateMap();
  const [stale, setStale] = useState<string | null>(null);

  const save = () => {
    if (readOnly || !history.dirty || mutation.isPending) return;
    const sent = history.map;
    mutation.mutate(
      { plateId, version: history.version, map: sent },
      {
        onSuccess: (saved) => {
          history.markSaved(sent, saved.version);
          toast.show(`Map saved (version ${saved.version}).`);
        },
        onError: (error) => {
          if (error instanceof ApiError && error.code === 'stale_version') setStale(error.message);
          else toast.show(`The map was not saved: ${error.message}`, 'error');
        },
      },
    );
  };

  const reload = async (keepCopy: boolean) => {
    if (keepCopy) {
      const clip = copyWholeMap(history.map, format);
      rememberClip(clip);
      await navigator.clipboard?.writeText(clipText(clip)).catch(() => undefined);
    }
    try {
      const fresh = await queryClient.fetchQuery({ ...getPlateQueryOptions(plateId), staleTime: 0 });
      history.load(fresh.map, fresh.version);
      setStale(null);
      toast.show(
        keepCopy
          ? `Reloaded version ${fresh.version}. Your version is in the clipboard: Ctrl+V (⌘V) on the map puts it back.`
          : `Reloaded version ${fresh.version}.`,
      );
    } catch (error) {
      toast.show(`The plate could not be reloaded: ${(error as Error).message}`, 'error');
    }
  };

  return { save, saving: mutation.isPending, stale, keepEditing: () => setStale(null), reload };
}
