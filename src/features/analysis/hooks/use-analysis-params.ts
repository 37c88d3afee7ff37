import { useCallback } from 'react';
import { useSearchParams } from 'react-router';

export const analysisViews = ['profiles', 'wells', 'exclusions', 'qc', 'settings'] as const;
export type AnalysisView = (typeof analysisViews)[number];

/**
 * What the analysis tab shows, kept in the address so a view, a variant or a well can be linked to
 * and survives a reload: ?view=wells&plate=…&well=B5, ?view=profiles&variant=….
 */
export function useAnalysisParams() {
  const [params, setParams] = useSearchParams();
  const raw = params.get('view');
  const view: AnalysisView = analysisViews.includes(raw as AnalysisView) ? (raw as AnalysisView) : 'profiles';
  const set = useCallback(
    (change: Partial<Record<'view' | 'variant' | 'plate' | 'well', string | null>>) =>
      setParams(
        (old) => {
          const next = new URLSearchParams(old);
          for (const [k, v] of Object.entries(change)) {
            if (v === null || v === undefined) next.delete(k);
            else next.set(k, v);
          }
          return next;
        },
        { replace: true },
      ),
    [setParams],
  );
  return { view, variant: params.get('variant'), plate: params.get('plate'), well: params.get('well'), set };
}
