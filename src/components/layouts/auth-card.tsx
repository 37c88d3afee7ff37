import type { ReactNode } from 'react';

export type AuthCardProps = { title: string; intro?: ReactNode; children: ReactNode; footer?: ReactNode };

/** The narrow centred card of the signed-out pages (sign in, reset, invitation). */
export function AuthCard({ title, intro, children, footer }: AuthCardProps) {
  return (
    <div className="mx-auto mt-10 w-full max-w-md">
      <div className="rounded-md border border-line bg-surface px-7 py-6 shadow-sm">
        <h1 className="text-xl">{title}</h1>
        {intro && <div className="mt-1 text-ink-muted">{intro}</div>}
        <div className="mt-5">{children}</div>
      </div>
      {footer && <div className="mt-4 text-center text-ink-muted">{footer}</div>}
    </div>
  );
}
