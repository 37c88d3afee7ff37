// The edits of the analysis tab in one place: settings (with the version shown), exclusions and
// their lifting. Each answer is the refitted analysis, which replaces the cached one at once.
import type { StudyAnalysis, StudyAnalysisSettings } from '@shared/schemas/analysis';
import { useToast } from '@/components/ui/toast';
import { ApiError } from '@/lib/api-client';
import { useExcludeWells } from '../api/exclude-wells';
import { useLiftExclusion } from '../api/lift-exclusion';
import { useSaveAnalysisSettings } from '../api/save-settings';

export function useAnalysisEdits(analysis: StudyAnalysis) {
  const toast = useToast();
  const save = useSaveAnalysisSettings();
  const exclude = useExcludeWells();
  const lift = useLiftExclusion();
  const saveSettings = (settings: StudyAnalysisSettings, done: string) =>
    save.mutate(
      { studyId: analysis.studyId, version: analysis.settingsVersion, settings },
      { onSuccess: () => toast.show(`${done} The profiles were refitted.`) },
    );
  /** Wells of one or several plates in one request: all are excluded, or none. */
  const excludeWells = async (wells: { plateId: string; well: string }[], reason: string) => {
    await exclude.mutateAsync({ studyId: analysis.studyId, wells, reason });
    toast.show(`${wells.map((w) => w.well).join(', ')} excluded; the profile was refitted.`);
  };
  const include = async (exclusionId: string, well: string, reason: string) => {
    await lift.mutateAsync({ exclusionId, reason });
    toast.show(`${well} is included again; the profile was refitted.`);
  };
  const stale = save.error instanceof ApiError && save.error.status === 409;
  return { save, exclude, lift, saveSettings, excludeWells, include, stale };
}
