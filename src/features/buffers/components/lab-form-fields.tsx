// One weighable form of a lab buffer: formula and formula weight (computed from the formula on
// request), counter-ions that place it in the charge balance, solid or liquid (with density).
import { useFormContext, useWatch } from 'react-hook-form';
import { molarMass } from '@shared/chemistry';
import { Button } from '@/components/ui/button';
import { SelectField, TextField } from '@/components/ui/field';
import type { LabBufferValues } from '../utils/lab-buffer-form';
import { errorAt, numeric, optionalNumber, requiredNumber } from './lab-fields';

export type LabFormFieldsProps = { index: number };

export function LabFormFields({ index }: LabFormFieldsProps) {
  const { register, formState, control, setValue, setError, clearErrors } = useFormContext<LabBufferValues>();
  const p = `forms.${index}` as const;
  const e = (name: string) => errorAt(formState.errors, `${p}.${name}`);
  const [formula, state] = useWatch({ control, name: [`${p}.formula`, `${p}.state`] });
  const computeWeight = () => {
    const result = molarMass(formula ?? '');
    if (result.ok) {
      clearErrors(`${p}.formulaWeight`);
      setValue(`${p}.formulaWeight`, Math.round(result.value.molarMass * 1000) / 1000, { shouldDirty: true });
    } else {
      setError(`${p}.formula`, { type: 'formula', message: result.error.message });
    }
  };
  return (
    <div className="grid grid-cols-4 gap-3">
      <TextField label="Form name" error={e('name')} {...register(`${p}.name`)} />
      <TextField label="Form id" placeholder="sodium-glycinate" error={e('id')} {...register(`${p}.id`)} />
      <TextField
        label="Formula"
        placeholder="C2H4NNaO2"
        className="[&_input]:font-mono"
        error={e('formula')}
        {...register(`${p}.formula`)}
      />
      <div className="flex items-end gap-1.5">
        <TextField
          label="Formula weight (g/mol)"
          type="number"
          step="any"
          className={`${numeric} flex-1`}
          error={e('formulaWeight')}
          {...register(`${p}.formulaWeight`, requiredNumber)}
        />
        <Button size="sm" className="mb-1" onClick={computeWeight}>
          From formula
        </Button>
      </div>
      {(['Na', 'K', 'Cl'] as const).map((ion) => (
        <TextField
          key={ion}
          label={`${ion} per formula unit`}
          type="number"
          step="any"
          className={numeric}
          error={e(`counterIons.${ion}`)}
          {...register(`${p}.counterIons.${ion}`, requiredNumber)}
        />
      ))}
      <TextField
        label="Buffer units per formula"
        type="number"
        step="any"
        className={numeric}
        hint="4 for borax."
        error={e('unitsPerFormula')}
        {...register(`${p}.unitsPerFormula`, requiredNumber)}
      />
      <SelectField label="State" error={e('state')} {...register(`${p}.state`)}>
        <option value="solid">Solid (weighed)</option>
        <option value="liquid">Liquid (measured by volume)</option>
      </SelectField>
      {state === 'liquid' && (
        <TextField
          label="Density (g/mL)"
          type="number"
          step="any"
          className={numeric}
          error={e('density')}
          {...register(`${p}.density`, optionalNumber)}
        />
      )}
      <TextField
        label="Note"
        hint="Optional."
        className="col-span-2"
        error={e('note')}
        {...register(`${p}.note`)}
      />
    </div>
  );
}
