// One ionization of a lab buffer: values, temperature model, useful range, the source of each
// value, and the recipe defaults (which forms to mix, or which to titrate with what).
import { useFormContext, useWatch } from 'react-hook-form';
import { SelectField, TextField } from '@/components/ui/field';
import type { LabBufferValues } from '../utils/lab-buffer-form';
import { errorAt, numeric, optionalNumber, requiredNumber } from './lab-fields';

export type LabIonizationFieldsProps = { index: number };

export function LabIonizationFields({ index }: LabIonizationFieldsProps) {
  const { register, formState, control } = useFormContext<LabBufferValues>();
  const p = `ionizations.${index}` as const;
  const e = (name: string) => errorAt(formState.errors, `${p}.${name}`);
  const [model, forms] = useWatch({ control, name: [`${p}.temperatureModel`, 'forms'] });
  const formOptions = (forms ?? []).filter((f) => f.id.trim() !== '');
  const formSelect = (name: 'mixAcid' | 'mixBase' | 'titrationStart', label: string, none: string) => (
    <SelectField label={label} error={e(name)} {...register(`${p}.${name}`)}>
      <option value="">{none}</option>
      {formOptions.map((f) => (
        <option key={f.id} value={f.id}>
          {f.name || f.id}
        </option>
      ))}
    </SelectField>
  );
  return (
    <div className="space-y-3">
      <div className="grid grid-cols-4 gap-3">
        <TextField label="Step label" error={e('label')} {...register(`${p}.label`)} />
        <TextField
          label="pKa at 25 °C, I = 0"
          type="number"
          step="any"
          className={numeric}
          error={e('pKa25')}
          {...register(`${p}.pKa25`, requiredNumber)}
        />
        <TextField
          label="Charge of the acid form"
          type="number"
          step={1}
          className={numeric}
          hint="0 for MES or acetate, +1 for Tris."
          error={e('zAcid')}
          {...register(`${p}.zAcid`, requiredNumber)}
        />
        <SelectField
          label="Temperature model"
          error={e('temperatureModel')}
          {...register(`${p}.temperatureModel`)}
        >
          <option value="goldberg">Goldberg (ΔH, ΔCp)</option>
          <option value="slope">Linear (dpKa/dT)</option>
          <option value="roy">Roy equation (A/T + B + C·lnT)</option>
        </SelectField>
        <TextField
          label="ΔH (kJ/mol)"
          type="number"
          step="any"
          className={numeric}
          error={e('dH')}
          {...register(`${p}.dH`, optionalNumber)}
        />
        <TextField
          label="ΔCp (J K⁻¹ mol⁻¹)"
          type="number"
          step="any"
          className={numeric}
          error={e('dCp')}
          {...register(`${p}.dCp`, optionalNumber)}
        />
        <TextField
          label="dpKa/dT (K⁻¹)"
          type="number"
          step="any"
          className={numeric}
          error={e('dpKadT')}
          {...register(`${p}.dpKadT`, optionalNumber)}
        />
        <div className="grid grid-cols-2 gap-2">
          <TextField
            label="Useful from"
            type="number"
            step="any"
            className={numeric}
            placeholder="pKa − 1"
            error={e('usefulLow')}
            {...register(`${p}.usefulLow`, optionalNumber)}
          />
          <TextField
            label="to (pH)"
            type="number"
            step="any"
            className={numeric}
            placeholder="pKa + 1"
            error={e('usefulHigh')}
            {...register(`${p}.usefulHigh`, optionalNumber)}
          />
        </div>
      </div>
      {model === 'roy' && (
        <div className="grid grid-cols-6 gap-3 rounded bg-canvas p-2">
          {(['A', 'B', 'C', 'validFromC', 'validToC'] as const).map((k) => (
            <TextField
              key={k}
              label={k === 'validFromC' ? 'Valid from (°C)' : k === 'validToC' ? 'Valid to (°C)' : k}
              type="number"
              step="any"
              className={numeric}
              error={e(`roy.${k}`)}
              {...register(`${p}.roy.${k}`, requiredNumber)}
            />
          ))}
          <TextField label="Equation source" error={e('roy.source')} {...register(`${p}.roy.source`)} />
        </div>
      )}
      <div className="grid grid-cols-5 gap-3">
        <TextField
          label="Source of pKa"
          placeholder="e.g. lab titration 2026-02"
          error={e('sources.pKa25')}
          {...register(`${p}.sources.pKa25`)}
        />
        <TextField label="Source of ΔH" error={e('sources.dH')} {...register(`${p}.sources.dH`)} />
        <TextField label="Source of ΔCp" error={e('sources.dCp')} {...register(`${p}.sources.dCp`)} />
        <TextField
          label="Source of dpKa/dT"
          error={e('sources.dpKadT')}
          {...register(`${p}.sources.dpKadT`)}
        />
        <TextField
          label="Row source"
          hint="Empty: the pKa’s source."
          error={e('sources.row')}
          {...register(`${p}.sources.row`)}
        />
      </div>
      <div className="grid grid-cols-4 gap-3">
        {formSelect('mixAcid', 'Mix: acid form', 'No mixing recipe')}
        {formSelect('mixBase', 'Mix: base form', '—')}
        {formSelect('titrationStart', 'Titrate: start form', 'No titration recipe')}
        <SelectField label="Titrant" error={e('titrant')} {...register(`${p}.titrant`)}>
          <option value="NaOH">NaOH</option>
          <option value="KOH">KOH</option>
          <option value="HCl">HCl</option>
        </SelectField>
      </div>
      <TextField label="Note on this step" hint="Optional." error={e('note')} {...register(`${p}.note`)} />
    </div>
  );
}
