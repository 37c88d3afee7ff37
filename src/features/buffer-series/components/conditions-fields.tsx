// Temperatures, concentration, ionic strength, salt, method, volume and overlap points.
import { useFormContext } from 'react-hook-form';
import { SelectField, TextField } from '@/components/ui/field';
import type { DesignerValues } from '../utils/designer-values';
import { Check, errorAt, numeric, optionalNumber, Panel, requiredNumber } from './form-bits';

export function ConditionsFields() {
  const { register, formState } = useFormContext<DesignerValues>();
  const e = (name: string) => errorAt(formState.errors, name);
  return (
    <Panel title="Conditions" className="col-span-3">
      <div className="grid grid-cols-4 items-start gap-2">
        <TextField
          label="Assay at (°C)"
          type="number"
          step="any"
          className={numeric}
          error={e('assayTemperatureC')}
          {...register('assayTemperatureC', requiredNumber)}
        />
        <TextField
          label="Made up at (°C)"
          type="number"
          step="any"
          className={numeric}
          hint="Where the pH is set; 25 °C is room temperature."
          error={e('makeTemperatureC')}
          {...register('makeTemperatureC', requiredNumber)}
        />
        <TextField
          label="Buffer (mM)"
          type="number"
          step="any"
          className={numeric}
          error={e('bufferConcMm')}
          {...register('bufferConcMm', requiredNumber)}
        />
        <TextField
          label="Target I (M)"
          type="number"
          step="any"
          className={numeric}
          hint="Optional ionic strength: salt tops every point up to it."
          error={e('targetIonicStrengthM')}
          {...register('targetIonicStrengthM', optionalNumber)}
        />
        <SelectField label="Salt" error={e('salt')} {...register('salt')}>
          <option value="NaCl">NaCl</option>
          <option value="KCl">KCl</option>
        </SelectField>
        <SelectField label="Method" className="col-span-2" error={e('method')} {...register('method')}>
          <option value="titrate">Titrate one form with acid or base</option>
          <option value="mix">Mix acid and base forms</option>
        </SelectField>
        <TextField
          label="Volume each (mL)"
          type="number"
          step="any"
          className={numeric}
          error={e('volumeMl')}
          {...register('volumeMl', requiredNumber)}
        />
        <div className="col-span-4 pt-1">
          <Check
            label="Overlap points"
            hint="Two buffers at one pH where the system changes."
            {...register('overlap')}
          />
        </div>
      </div>
    </Panel>
  );
}
