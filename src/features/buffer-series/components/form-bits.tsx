// Small pieces of the designer's input panel.
import type { ReactNode } from 'react';
import type { FieldError, FieldErrors } from 'react-hook-form';

export const optionalNumber = { setValueAs: (v: unknown) => (v === '' || v === null ? null : Number(v)) };
export const requiredNumber = { valueAsNumber: true } as const;
export const numeric = '[&_input]:text-right';

export function errorAt(errors: FieldErrors, path: string): string | undefined {
  let node: unknown = errors;
  for (const part of path.split('.')) {
    if (node === null || typeof node !== 'object') return undefined;
    node = (node as Record<string, unknown>)[part];
  }
  return (node as FieldError | undefined)?.message;
}

export function Panel({
  title,
  children,
  className = '',
}: {
  title: string;
  children: ReactNode;
  className?: string;
}) {
  return (
    <fieldset className={`rounded border border-line bg-surface px-3 pt-1 pb-3 ${className}`}>
      <legend className="px-1 font-semibold">{title}</legend>
      {children}
    </fieldset>
  );
}

export function Check({
  label,
  hint,
  ...input
}: React.InputHTMLAttributes<HTMLInputElement> & { label: string; hint?: string }) {
  return (
    <label className="flex items-start gap-2">
      <input type="checkbox" className="mt-1 size-4 accent-accent-700" {...input} />
      <span>
        <span className="font-semibold">{label}</span>
        {hint && <span className="block text-sm text-ink-muted">{hint}</span>}
      </span>
    </label>
  );
}
