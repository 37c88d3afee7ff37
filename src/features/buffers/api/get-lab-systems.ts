import { useQueries, type UseQueryResult } from '@tanstack/react-query';
import type { BufferSystem } from '@shared/chemistry';
import type { BufferDetail } from '@shared/schemas/buffers-types';
import { getBufferQueryOptions } from './get-buffer';
import { useBuffers } from './get-buffers';

// A stable function, so the combined array keeps its identity while nothing changes.
const systemsOf = (results: UseQueryResult<BufferDetail>[]) =>
  results.flatMap((r) => (r.data ? [r.data.system] : []));

/**
 * The lab-added systems in full (GET /buffers lists summaries only): the browser needs them to
 * compute curves of recipes that use them. Built-in systems ship with shared/chemistry.
 */
export function useLabSystems(): BufferSystem[] {
  const buffers = useBuffers();
  const labIds = (buffers.data ?? []).filter((b) => !b.builtIn).map((b) => b.id);
  return useQueries({
    queries: labIds.map((id) => getBufferQueryOptions(id)),
    combine: systemsOf,
  });
}
