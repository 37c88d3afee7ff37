import type { ButtonHTMLAttributes } from 'react';
import { Spinner } from './spinner';

const variants = {
  primary: 'bg-accent-700 text-white hover:bg-accent-800 border-accent-700',
  secondary: 'bg-surface text-ink border-line-strong hover:bg-canvas',
  ghost: 'bg-transparent text-accent-700 border-transparent hover:bg-accent-50',
} as const;

const sizes = { sm: 'h-7 px-2.5 text-sm', md: 'h-9 px-3.5' } as const;

export type ButtonProps = ButtonHTMLAttributes<HTMLButtonElement> & {
  variant?: keyof typeof variants;
  size?: keyof typeof sizes;
  /** Shows a spinner and blocks a second click while the request runs. */
  busy?: boolean;
};

export function Button({
  variant = 'secondary',
  size = 'md',
  busy,
  disabled,
  className = '',
  children,
  ...rest
}: ButtonProps) {
  return (
    <button
      type="button"
      {...rest}
      disabled={disabled || busy}
      aria-busy={busy || undefined}
      className={`inline-flex items-center justify-center gap-1.5 whitespace-nowrap rounded border font-semibold transition-colors disabled:cursor-not-allowed disabled:opacity-55 ${variants[variant]} ${sizes[size]} ${className}`}
    >
      {busy && <Spinner className="size-3.5" />}
      {children}
    </button>
  );
}
