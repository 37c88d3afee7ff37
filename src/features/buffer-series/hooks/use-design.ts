// The design the screen shows: the saved one while the inputs equal the saved request, otherwise a
// fresh preview from the API once typing settles. With overrides, the design without them is
// fetched too: an overridden point comes back with no alternatives, and the choices come from there.
import type { DesignedSeries, SeriesDetail, SeriesRequest } from '@shared/schemas/buffer-series';
import { useSeriesDesign } from '../api/design-series';
import { stableJson } from '../utils/stable-json';
import { useDebouncedValue } from './use-debounced-value';

export type DesignState = {
  design: DesignedSeries | undefined;
  choices: DesignedSeries | undefined;
  /** The request the shown design answers. */
  request: SeriesRequest | null;
  pending: boolean;
  error: Error | null;
  /** The inputs differ from the saved request. */
  changed: boolean;
};

export function useDesign(request: SeriesRequest | null, saved: SeriesDetail | undefined): DesignState {
  const settled = useDebouncedValue(request);
  const isSaved = (r: SeriesRequest | null) =>
    Boolean(saved && r && stableJson(r) === stableJson(saved.input));
  const showSaved = isSaved(settled) && isSaved(request);
  const preview = useSeriesDesign(showSaved ? null : settled);
  const hasOverrides = Boolean(settled && Object.keys(settled.overrides).length > 0);
  const base = useSeriesDesign(hasOverrides && settled ? { ...settled, overrides: {} } : null);
  const design = showSaved ? saved!.design : request === null || preview.isError ? undefined : preview.data;
  return {
    design,
    choices: hasOverrides ? base.data : design,
    request: showSaved ? saved!.input : settled,
    pending:
      !showSaved && request !== null && (preview.isFetching || stableJson(settled) !== stableJson(request)),
    error: showSaved ? null : preview.error,
    changed: Boolean(saved) && !isSaved(request),
  };
}
