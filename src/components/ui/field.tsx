// Labelled form controls with their hint and error, wired for screen readers (getByLabel works).
import { useId, type InputHTMLAttributes, type ReactNode, type Ref, type SelectHTMLAttributes } from 'react';

const control =
  'block w-full rounded border bg-surface px-2.5 text-ink placeholder:text-ink-faint disabled:bg-canvas disabled:text-ink-muted';
const borders = (error?: string) =>
  error ? 'border-danger-600' : 'border-line-strong focus:border-accent-600';

type FieldFrameProps = {
  id: string;
  label: string;
  hint?: ReactNode;
  error?: string;
  children: ReactNode;
  className?: string;
};

function FieldFrame({ id, label, hint, error, children, className = '' }: FieldFrameProps) {
  return (
    <div className={className}>
      <label htmlFor={id} className="mb-1 block font-semibold text-ink">
        {label}
      </label>
      {children}
      {hint && !error && (
        <p id={`${id}-hint`} className="mt-1 text-sm text-ink-muted">
          {hint}
        </p>
      )}
      {error && (
        <p id={`${id}-error`} className="mt-1 text-sm text-danger-600">
          {error}
        </p>
      )}
    </div>
  );
}

const describedBy = (id: string, hint?: ReactNode, error?: string) =>
  error ? `${id}-error` : hint ? `${id}-hint` : undefined;

export type TextFieldProps = InputHTMLAttributes<HTMLInputElement> & {
  label: string;
  hint?: ReactNode;
  error?: string;
  ref?: Ref<HTMLInputElement>;
};

export function TextField({ label, hint, error, id, className, ref, ...rest }: TextFieldProps) {
  const autoId = useId();
  const inputId = id ?? autoId;
  return (
    <FieldFrame id={inputId} label={label} hint={hint} error={error} className={className}>
      <input
        ref={ref}
        id={inputId}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(inputId, hint, error)}
        className={`${control} h-9 ${borders(error)}`}
        {...rest}
      />
    </FieldFrame>
  );
}

export type SelectFieldProps = SelectHTMLAttributes<HTMLSelectElement> & {
  label: string;
  hint?: ReactNode;
  error?: string;
  ref?: Ref<HTMLSelectElement>;
};

export function SelectField({ label, hint, error, id, className, ref, children, ...rest }: SelectFieldProps) {
  const autoId = useId();
  const selectId = id ?? autoId;
  return (
    <FieldFrame id={selectId} label={label} hint={hint} error={error} className={className}>
      <select
        ref={ref}
        id={selectId}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(selectId, hint, error)}
        className={`${control} h-9 pr-8 ${borders(error)}`}
        {...rest}
      >
        {children}
      </select>
    </FieldFrame>
  );
}

export type TextAreaFieldProps = InputHTMLAttributes<HTMLTextAreaElement> & {
  label: string;
  hint?: ReactNode;
  error?: string;
  rows?: number;
  ref?: Ref<HTMLTextAreaElement>;
};

export function TextAreaField({
  label,
  hint,
  error,
  id,
  className,
  ref,
  rows = 3,
  ...rest
}: TextAreaFieldProps) {
  const autoId = useId();
  const areaId = id ?? autoId;
  return (
    <FieldFrame id={areaId} label={label} hint={hint} error={error} className={className}>
      <textarea
        ref={ref}
        id={areaId}
        rows={rows}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(areaId, hint, error)}
        className={`${control} py-1.5 ${borders(error)}`}
        {...rest}
      />
    </FieldFrame>
  );
}
