import type { ReactNode } from 'react';

export type ReportSectionProps = {
  title: string;
  children: ReactNode;
  /** Keep the whole section on one page (short sections). */
  keep?: boolean;
  description?: ReactNode;
};

/** A titled part of a report; the title never ends a printed page. */
export function ReportSection({ title, children, keep, description }: ReportSectionProps) {
  return (
    <section aria-label={title} className={keep ? 'report-keep' : undefined}>
      <h2 className="mb-1 border-b border-line pb-0.5 text-lg">{title}</h2>
      {description && <p className="mb-2 text-sm text-ink-muted">{description}</p>}
      {children}
    </section>
  );
}
