// The pH points: a typed list ("3, 3.5, 4") or start–stop–step; the points that result are shown.
import { useFormContext, useWatch } from 'react-hook-form';
import { TextField } from '@/components/ui/field';
import { inkOnPh, phColor } from '@/components/ui/ph-scale';
import { pHPointsOf, type DesignerValues } from '../utils/designer-values';
import { errorAt, numeric, Panel, requiredNumber } from './form-bits';

export function PHPointsFields() {
  const { register, formState, control } = useFormContext<DesignerValues>();
  const e = (name: string) => errorAt(formState.errors, name);
  const values = useWatch({ control }) as DesignerValues;
  const mode = values.pHMode;
  const points = pHPointsOf(values);
  return (
    <Panel title="pH points" className="col-span-2">
      <div className="mb-2 flex gap-4" role="radiogroup" aria-label="How the pH points are given">
        <label className="flex items-center gap-1.5">
          <input type="radio" value="range" className="accent-accent-700" {...register('pHMode')} />
          Start, stop and step
        </label>
        <label className="flex items-center gap-1.5">
          <input type="radio" value="list" className="accent-accent-700" {...register('pHMode')} />A list
        </label>
      </div>
      {mode === 'list' ? (
        <TextField
          label="pH points"
          placeholder="3, 3.5, 4, 4.5"
          hint="Separated by commas or spaces; 0–14, at most 96 points."
          error={e('pHList')}
          {...register('pHList')}
        />
      ) : (
        <div className="grid grid-cols-3 gap-2">
          <TextField
            label="Start pH"
            type="number"
            step="any"
            className={numeric}
            error={e('pHStart')}
            {...register('pHStart', requiredNumber)}
          />
          <TextField
            label="Stop pH"
            type="number"
            step="any"
            className={numeric}
            error={e('pHStop')}
            {...register('pHStop', requiredNumber)}
          />
          <TextField
            label="Step"
            type="number"
            step="any"
            className={numeric}
            error={e('pHStep')}
            {...register('pHStep', requiredNumber)}
          />
        </div>
      )}
      <p className="mt-2 flex flex-wrap items-center gap-1 text-sm text-ink-muted" aria-live="polite">
        {points.length === 0 ? (
          'No points yet.'
        ) : (
          <>
            <span className="mr-1">
              {points.length} point{points.length === 1 ? '' : 's'}:
            </span>
            {points.slice(0, 40).map((p) => (
              <span
                key={p}
                className="rounded px-1 tabular-nums"
                style={{ background: phColor(p), color: inkOnPh(p) }}
                title={`pH ${p}`}
              >
                {p.toFixed(2)}
              </span>
            ))}
            {points.length > 40 && <span>…</span>}
          </>
        )}
      </p>
    </Panel>
  );
}
