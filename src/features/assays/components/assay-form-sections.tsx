// The field groups of the assay form. Each reads the form from context and shows only the fields
// that apply to the choices made so far.
import { useEffect, type ReactNode } from 'react';
import { useFormContext, useWatch, type FieldErrors } from 'react-hook-form';
import type { TeamRef } from '@shared/schemas/api-types';
import { SelectField, TextAreaField, TextField } from '@/components/ui/field';
import {
  detectionLabels,
  extinctionUnitLabels,
  quantitationLabels,
  readModeLabels,
  regimeLabels,
} from '../utils/assay-words';
import type { AssayFormValues } from './assay-form';

const optionalNumber = { setValueAs: (v: unknown) => (v === '' || v === null ? null : Number(v)) };
const requiredNumber = { valueAsNumber: true } as const;
const numeric = '[&_input]:text-right';

function Section({ title, children }: { title: string; children: ReactNode }) {
  return (
    <fieldset className="rounded border border-line bg-surface px-4 pt-2 pb-4">
      <legend className="px-1 text-base font-semibold">{title}</legend>
      <div className="grid grid-cols-3 gap-4">{children}</div>
    </fieldset>
  );
}

const message = (errors: FieldErrors<AssayFormValues>, name: keyof AssayFormValues) =>
  errors[name]?.message as string | undefined;

export function IdentitySection({ teams, editing }: { teams: TeamRef[]; editing: boolean }) {
  const { register, formState } = useFormContext<AssayFormValues>();
  const e = formState.errors;
  return (
    <Section title="Assay">
      <TextField label="Name" className="col-span-2" error={message(e, 'name')} {...register('name')} />
      {editing ? (
        <p className="self-end pb-2 text-ink-muted">
          <input type="hidden" {...register('teamId')} />
          The team of an assay does not change.
        </p>
      ) : (
        <SelectField label="Team" error={message(e, 'teamId')} {...register('teamId')}>
          <option value="">Choose a team…</option>
          {teams.map((t) => (
            <option key={t.id} value={t.id}>
              {t.name}
            </option>
          ))}
        </SelectField>
      )}
      <TextAreaField
        label="Notes"
        hint="Optional."
        className="col-span-3"
        rows={2}
        error={message(e, 'notes')}
        {...register('notes')}
      />
    </Section>
  );
}

export function SubstrateSection() {
  const { register, formState } = useFormContext<AssayFormValues>();
  const e = formState.errors;
  return (
    <Section title="Substrate">
      <TextField label="Substrate" error={message(e, 'substrate')} {...register('substrate')} />
      <TextField
        label="Concentration (mM)"
        type="number"
        step="any"
        className={numeric}
        error={message(e, 'substrateMm')}
        {...register('substrateMm', requiredNumber)}
      />
      <TextField
        label="KM (mM)"
        type="number"
        step="any"
        className={numeric}
        hint="Optional, if known."
        error={message(e, 'kmMm')}
        {...register('kmMm', optionalNumber)}
      />
      <SelectField
        label="Substrate relative to KM"
        className="col-span-3"
        hint="Decides what the pH profile reports: kcat when saturating, kcat/KM well below KM, a mixture in between."
        error={message(e, 'substrateRegime')}
        {...register('substrateRegime')}
      >
        {Object.entries(regimeLabels).map(([value, label]) => (
          <option key={value} value={value}>
            {label}
          </option>
        ))}
      </SelectField>
    </Section>
  );
}

export function ReadingSection() {
  const { register, formState, control, setValue } = useFormContext<AssayFormValues>();
  const e = formState.errors;
  const [detection, readMode] = useWatch({ control, name: ['detection', 'readMode'] });
  useEffect(() => {
    // Fluorescence is quantified against a standard curve (the schema refuses ε for it).
    if (detection === 'fluorescence') setValue('quantitation', 'standard-curve');
  }, [detection, setValue]);
  return (
    <Section title="Reading">
      <SelectField label="Read mode" error={message(e, 'readMode')} {...register('readMode')}>
        {Object.entries(readModeLabels).map(([value, label]) => (
          <option key={value} value={value}>
            {label}
          </option>
        ))}
      </SelectField>
      <SelectField label="Detection" error={message(e, 'detection')} {...register('detection')}>
        {Object.entries(detectionLabels).map(([value, label]) => (
          <option key={value} value={value}>
            {label}
          </option>
        ))}
      </SelectField>
      <TextField
        label={detection === 'fluorescence' ? 'Excitation (nm)' : 'Wavelength (nm)'}
        type="number"
        step={1}
        className={numeric}
        error={message(e, 'wavelengthNm')}
        {...register('wavelengthNm', requiredNumber)}
      />
      {detection === 'fluorescence' && (
        <TextField
          label="Emission (nm)"
          type="number"
          step={1}
          className={numeric}
          error={message(e, 'emissionNm')}
          {...register('emissionNm', optionalNumber)}
        />
      )}
      <TextField
        label="Temperature (°C)"
        type="number"
        step="any"
        className={numeric}
        error={message(e, 'temperatureC')}
        {...register('temperatureC', requiredNumber)}
      />
      {readMode === 'endpoint' && (
        <TextField
          label="Stop solution"
          placeholder="0.5 M NaOH, 100 µL per well"
          hint="Optional. A strong base stop lets one standard serve every pH."
          error={message(e, 'stopSolution')}
          {...register('stopSolution')}
        />
      )}
    </Section>
  );
}

export function QuantitationSection() {
  const { register, formState, control } = useFormContext<AssayFormValues>();
  const e = formState.errors;
  const [detection, quantitation] = useWatch({ control, name: ['detection', 'quantitation'] });
  return (
    <Section title="Quantitation">
      <SelectField label="Quantified by" error={message(e, 'quantitation')} {...register('quantitation')}>
        {Object.entries(quantitationLabels).map(([value, label]) => (
          <option key={value} value={value} disabled={detection === 'fluorescence' && value === 'extinction'}>
            {label}
          </option>
        ))}
      </SelectField>
      {quantitation === 'extinction' && detection === 'absorbance' && (
        <>
          <TextField
            label="Extinction coefficient ε"
            type="number"
            step="any"
            className={numeric}
            error={message(e, 'extinctionCoefficient')}
            {...register('extinctionCoefficient', optionalNumber)}
          />
          <SelectField label="Unit of ε" error={message(e, 'extinctionUnit')} {...register('extinctionUnit')}>
            {Object.entries(extinctionUnitLabels).map(([value, label]) => (
              <option key={value} value={value}>
                {label}
              </option>
            ))}
          </SelectField>
        </>
      )}
      <TextField
        label="Path length (cm)"
        type="number"
        step="any"
        className={numeric}
        hint="Optional: otherwise it follows from the well volume."
        error={message(e, 'pathLengthCm')}
        {...register('pathLengthCm', optionalNumber)}
      />
      <TextField
        label="Well volume (µL)"
        type="number"
        step="any"
        className={numeric}
        error={message(e, 'wellVolumeUl')}
        {...register('wellVolumeUl', requiredNumber)}
      />
      <TextField
        label="Chromophore pKa"
        type="number"
        step="any"
        className={`col-span-3 ${numeric} [&_input]:w-40`}
        hint="Optional. Give it when the product’s signal depends on pH (4-nitrophenol: pKa ≈ 7.15, only the phenolate absorbs at 405 nm): reads at different pH then need a stop with strong base, or standards at every pH."
        error={message(e, 'chromophorePka')}
        {...register('chromophorePka', optionalNumber)}
      />
    </Section>
  );
}
