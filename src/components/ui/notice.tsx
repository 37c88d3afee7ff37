import type { ReactNode } from 'react';

const tones = {
  info: 'border-accent-200 bg-accent-50 text-accent-900',
  success: 'border-accent-300 bg-accent-50 text-accent-900',
  warning: 'border-warn-200 bg-warn-50 text-warn-800',
  error: 'border-danger-200 bg-danger-50 text-danger-800',
} as const;

export type NoticeProps = {
  tone?: keyof typeof tones;
  title?: string;
  children?: ReactNode;
  className?: string;
};

/** A message in the flow of the page. Errors are announced to screen readers at once. */
export function Notice({ tone = 'info', title, children, className = '' }: NoticeProps) {
  return (
    <div
      role={tone === 'error' ? 'alert' : 'status'}
      className={`rounded border px-3 py-2 ${tones[tone]} ${className}`}
    >
      {title && <p className="font-semibold">{title}</p>}
      {children && <div className={title ? 'mt-0.5' : ''}>{children}</div>}
    </div>
  );
}

export type QueryErrorProps = { error: Error; onRetry?: () => void; what?: string };

/** A failed load: what failed, the server's words, and a way to try again. */
export function QueryError({ error, onRetry, what = 'this page' }: QueryErrorProps) {
  return (
    <Notice tone="error" title={`Could not load ${what}`} className="my-4">
      <p>{error.message}</p>
      {onRetry && (
        <button type="button" onClick={onRetry} className="mt-1 font-semibold underline">
          Try again
        </button>
      )}
    </Notice>
  );
}
