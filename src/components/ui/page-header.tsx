import type { ReactNode } from 'react';

export type PageHeaderProps = { title: string; description?: ReactNode; actions?: ReactNode };

export function PageHeader({ title, description, actions }: PageHeaderProps) {
  return (
    <div className="mb-5 flex items-end justify-between gap-6 border-b border-line pb-3">
      <div>
        <h1 className="text-2xl leading-tight">{title}</h1>
        {description && <p className="mt-1 max-w-3xl text-ink-muted">{description}</p>}
      </div>
      {actions && <div className="no-print flex shrink-0 items-center gap-2">{actions}</div>}
    </div>
  );
}
