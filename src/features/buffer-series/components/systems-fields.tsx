// Which buffer systems the designer may propose: its default set, or the ones ticked here.
import { Controller, useFormContext, useWatch } from 'react-hook-form';
import type { BufferSummary } from '@shared/schemas/buffers-types';
import { formatFixed } from '@/components/ui/numbers';
import type { DesignerValues } from '../utils/designer-values';
import { errorAt, Panel } from './form-bits';

export type SystemsFieldsProps = { library: BufferSummary[] };

export function SystemsFields({ library }: SystemsFieldsProps) {
  const { register, formState, control } = useFormContext<DesignerValues>();
  const mode = useWatch({ control, name: 'systemsMode' });
  const error = errorAt(formState.errors, 'systems');
  return (
    <Panel title="Allowed buffer systems" className="col-span-5">
      <div className="mb-2 flex gap-4" role="radiogroup" aria-label="Which systems the designer may use">
        <label className="flex items-center gap-1.5">
          <input type="radio" value="default" className="accent-accent-700" {...register('systemsMode')} />
          The designer’s default set ({library.filter((b) => b.designerDefault).length} systems)
        </label>
        <label className="flex items-center gap-1.5">
          <input type="radio" value="chosen" className="accent-accent-700" {...register('systemsMode')} />
          Only the systems I tick
        </label>
      </div>
      {mode === 'chosen' && (
        <Controller
          control={control}
          name="systems"
          render={({ field }) => (
            <div className="grid max-h-52 grid-cols-4 gap-x-4 gap-y-0.5 overflow-y-auto rounded border border-line px-2 py-1">
              {library.map((b) => (
                <label key={b.id} className="flex items-baseline gap-1.5 text-sm">
                  <input
                    type="checkbox"
                    className="size-3.5 accent-accent-700"
                    checked={field.value.includes(b.id)}
                    onChange={(ev) =>
                      field.onChange(
                        ev.target.checked ? [...field.value, b.id] : field.value.filter((id) => id !== b.id),
                      )
                    }
                  />
                  <span>{b.name}</span>
                  <span className="text-ink-muted tabular-nums">
                    {b.steps.map((s) => formatFixed(s.pKa25, 2)).join(', ')}
                  </span>
                </label>
              ))}
            </div>
          )}
        />
      )}
      {error && <p className="mt-1 text-sm text-danger-600">{error}</p>}
    </Panel>
  );
}
