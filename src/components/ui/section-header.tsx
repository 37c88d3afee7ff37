import type { ReactNode } from 'react';

export type SectionHeaderProps = {
  title: string;
  description?: ReactNode;
  actions?: ReactNode;
  above?: ReactNode;
};

/** The heading of a page inside a layout that already has the page's h1 (a study's tabs). */
export function SectionHeader({ title, description, actions, above }: SectionHeaderProps) {
  return (
    <div className="mb-4 flex items-end justify-between gap-6">
      <div>
        {above && <p className="mb-0.5 text-sm">{above}</p>}
        <h2 className="text-xl leading-tight">{title}</h2>
        {description && <p className="mt-0.5 max-w-3xl text-ink-muted">{description}</p>}
      </div>
      {actions && <div className="no-print flex shrink-0 items-center gap-2">{actions}</div>}
    </div>
  );
}
