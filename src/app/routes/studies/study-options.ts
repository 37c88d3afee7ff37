// The records a study form chooses from, gathered from their features (a route composes them).
import { useAssays } from '@/features/assays/api/get-assays';
import { useSeriesList } from '@/features/buffer-series/api/get-series-list';
import { useEnzymes } from '@/features/enzymes/api/get-enzymes';
import type { RecordOption } from '@/features/studies/components/study-form';

export function useStudyOptions() {
  const enzymes = useEnzymes();
  const assays = useAssays();
  const series = useSeriesList();
  const pending = enzymes.isPending || assays.isPending || series.isPending;
  const error = enzymes.error ?? assays.error ?? series.error;
  const options: { enzymes: RecordOption[]; assays: RecordOption[]; series: RecordOption[] } = {
    enzymes: (enzymes.data ?? []).map((e) => ({ id: e.id, name: e.name, teamId: e.teamId })),
    assays: (assays.data ?? []).map((a) => ({ id: a.id, name: a.name, teamId: a.teamId })),
    series: (series.data ?? []).map((s) => ({
      id: s.id,
      name: s.name,
      teamId: s.teamId,
      hint: `pH ${Math.min(...s.input.pHPoints)}–${Math.max(...s.input.pHPoints)}`,
    })),
  };
  return { pending, error, options };
}
