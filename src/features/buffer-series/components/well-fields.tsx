// The well: buffer volume and the solutions added to it (enzyme, substrate), each in water or in
// its own buffer, so the designer can say what pH the well really reaches.
import { useFieldArray, useFormContext, useWatch } from 'react-hook-form';
import type { BufferSummary } from '@shared/schemas/buffers-types';
import { Button } from '@/components/ui/button';
import { SelectField, TextField } from '@/components/ui/field';
import { newAddition, type DesignerValues } from '../utils/designer-values';
import { Check, errorAt, numeric, Panel, requiredNumber } from './form-bits';

export type WellFieldsProps = { library: BufferSummary[] };

export function WellFields({ library }: WellFieldsProps) {
  const { register, formState, control } = useFormContext<DesignerValues>();
  const e = (name: string) => errorAt(formState.errors, name);
  const additions = useFieldArray({ control, name: 'additions' });
  const [enabled, values] = useWatch({ control, name: ['wellEnabled', 'additions'] });
  return (
    <Panel title="Well" className="col-span-5">
      <div className="mb-2 flex items-end gap-4">
        <Check
          label="Predict the pH in the well"
          hint="The buffer plus what is added to it; a drift above 0.05 pH is flagged."
          {...register('wellEnabled')}
        />
        {enabled && (
          <TextField
            label="Buffer per well (µL)"
            type="number"
            step="any"
            className={`${numeric} w-40`}
            error={e('bufferVolumeUl')}
            {...register('bufferVolumeUl', requiredNumber)}
          />
        )}
      </div>
      {enabled && (
        <div className="space-y-2">
          {additions.fields.map((field, i) => {
            const inBuffer = values?.[i]?.inBuffer;
            return (
              <div
                key={field.id}
                className="grid grid-cols-[1.4fr_0.7fr_1fr_1.2fr_0.7fr_0.6fr_auto] items-end gap-2"
              >
                <TextField
                  label="Addition"
                  error={e(`additions.${i}.label`)}
                  {...register(`additions.${i}.label`)}
                />
                <TextField
                  label="Volume (µL)"
                  type="number"
                  step="any"
                  className={numeric}
                  error={e(`additions.${i}.volumeUl`)}
                  {...register(`additions.${i}.volumeUl`, requiredNumber)}
                />
                <SelectField
                  label="Made up in"
                  {...register(`additions.${i}.inBuffer`, {
                    setValueAs: (v: unknown) => v === true || v === 'true',
                  })}
                >
                  <option value="false">Water</option>
                  <option value="true">Its own buffer</option>
                </SelectField>
                {inBuffer ? (
                  <>
                    <SelectField
                      label="Its buffer"
                      error={e(`additions.${i}.systemId`)}
                      {...register(`additions.${i}.systemId`)}
                    >
                      {library.map((b) => (
                        <option key={b.id} value={b.id}>
                          {b.name}
                        </option>
                      ))}
                    </SelectField>
                    <TextField
                      label="mM"
                      type="number"
                      step="any"
                      className={numeric}
                      error={e(`additions.${i}.concMm`)}
                      {...register(`additions.${i}.concMm`, requiredNumber)}
                    />
                    <TextField
                      label="pH"
                      type="number"
                      step="any"
                      className={numeric}
                      error={e(`additions.${i}.pH`)}
                      {...register(`additions.${i}.pH`, requiredNumber)}
                    />
                  </>
                ) : (
                  <span className="col-span-3" />
                )}
                <Button size="sm" variant="ghost" className="mb-1" onClick={() => additions.remove(i)}>
                  Remove<span className="sr-only"> {values?.[i]?.label}</span>
                </Button>
              </div>
            );
          })}
          {additions.fields.length < 6 && (
            <Button
              size="sm"
              onClick={() => additions.append(newAddition(`Addition ${additions.fields.length + 1}`))}
            >
              Add a solution
            </Button>
          )}
        </div>
      )}
    </Panel>
  );
}
