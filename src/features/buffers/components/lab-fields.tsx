// Small pieces shared by the lab buffer form's sections.
import type { ReactNode } from 'react';
import type { FieldError, FieldErrors } from 'react-hook-form';

export const optionalNumber = { setValueAs: (v: unknown) => (v === '' || v === null ? null : Number(v)) };
export const requiredNumber = { valueAsNumber: true } as const;
export const numeric = '[&_input]:text-right';

/** The message at a dotted path of a nested errors object ("ionizations.0.pKa25"). */
export function errorAt(errors: FieldErrors, path: string): string | undefined {
  let node: unknown = errors;
  for (const part of path.split('.')) {
    if (node === null || typeof node !== 'object') return undefined;
    node = (node as Record<string, unknown>)[part];
  }
  return (node as FieldError | undefined)?.message;
}

export function FormSection({
  title,
  actions,
  children,
}: {
  title: string;
  actions?: ReactNode;
  children: ReactNode;
}) {
  return (
    <fieldset className="rounded border border-line bg-surface px-4 pt-2 pb-4">
      <legend className="px-1 text-base font-semibold">{title}</legend>
      {actions && <div className="-mt-1 mb-2 flex justify-end gap-2">{actions}</div>}
      {children}
    </fieldset>
  );
}
