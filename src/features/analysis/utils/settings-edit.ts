// Changes to the analysis settings as pure functions: the screen edits a copy and saves it with the
// version it was showing (the server answers 409 when someone else saved in between).
import type { StudyAnalysisSettings } from '@shared/schemas/analysis';

export type WindowScope = 'well' | 'variant' | 'plate';
export type RateWindow = { startS: number; endS: number };

/** The key a window is stored under: `plateId:A1` for a well, the variant or plate id otherwise. */
export function windowKey(
  scope: WindowScope,
  target: { plateId: string; well: string; variantId: string | null },
) {
  if (scope === 'well') return `${target.plateId}:${target.well}`;
  if (scope === 'variant') return target.variantId;
  return target.plateId;
}

/** Sets (or, with null, clears) the window of one scope; empty maps are dropped. */
export function withWindow(
  settings: StudyAnalysisSettings,
  scope: WindowScope,
  key: string,
  window: RateWindow | null,
): StudyAnalysisSettings {
  const windows = { ...settings.rateWindows };
  const map = { ...windows[scope] };
  if (window) map[key] = window;
  else delete map[key];
  if (Object.keys(map).length) windows[scope] = map;
  else delete windows[scope];
  const { rateWindows: _old, ...rest } = settings;
  return Object.keys(windows).length ? { ...rest, rateWindows: windows } : rest;
}

/** Sets one entry of a per-id map setting (models, plate reads, preparations); null or 'auto' clears it. */
export function withEntry<K extends 'models' | 'plateReads' | 'preparations'>(
  settings: StudyAnalysisSettings,
  field: K,
  id: string,
  value: string | null,
): StudyAnalysisSettings {
  const map: Record<string, string> = { ...(settings[field] as Record<string, string> | undefined) };
  if (value === null || value === '' || (field === 'models' && value === 'auto')) delete map[id];
  else map[id] = value;
  const next = { ...settings } as Record<string, unknown>;
  if (Object.keys(map).length) next[field] = map;
  else delete next[field];
  return next as StudyAnalysisSettings;
}
