// The frame of a printable report: a screen-only bar (back, Print), then an A4-wide sheet. The
// sheet is as wide on screen as on paper (186 mm: A4 less 12 mm margins), so charts drawn for the
// screen print at the same size. The app's header and navigation are hidden in print (index.css).
import type { ReactNode } from 'react';
import { Link } from 'react-router';
import { Button } from '@/components/ui/button';
import { Cautions } from './cautions';

export type ReportPageProps = {
  title: string;
  /** What the report is of, under the title (study status, team, date printed). */
  subtitle?: ReactNode;
  back: { href: string; label: string };
  children: ReactNode;
};

// A4 with 12 mm side margins; the sheet below keeps to 186 mm.
const pageCss = `@page { size: A4; margin: 14mm 12mm 16mm; }
@media print {
  .report-sheet h2, .report-sheet h3 { break-after: avoid; }
  .report-sheet figure, .report-keep { break-inside: avoid; }
  .report-sheet { font-size: 10pt; }
}`;

export function ReportPage({ title, subtitle, back, children }: ReportPageProps) {
  return (
    <>
      <style>{pageCss}</style>
      <div className="no-print mx-auto mb-4 flex w-[210mm] items-center justify-between">
        <Link to={back.href} className="text-sm text-accent-700 hover:underline">
          {back.label}
        </Link>
        <div className="flex items-center gap-3">
          <p className="text-sm text-ink-muted">A4, portrait. Charts print as drawn here.</p>
          <Button variant="primary" onClick={() => window.print()}>
            Print
          </Button>
        </div>
      </div>
      <div className="mx-auto w-fit bg-surface p-[12mm] ring-1 ring-line print:p-0 print:ring-0">
        <article aria-label={title} className="report-sheet w-[186mm] space-y-6">
          {/* Not a <header>: print CSS hides the app's header elements. */}
          <div className="border-b-2 border-ink pb-2">
            <p className="text-sm text-ink-muted">Bellwether report</p>
            <h1 className="text-2xl leading-tight">{title}</h1>
            {subtitle && <div className="mt-1 text-ink-muted">{subtitle}</div>}
          </div>
          {children}
          <Cautions />
        </article>
      </div>
    </>
  );
}
