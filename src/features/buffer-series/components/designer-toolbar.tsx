// What can be done with the design: save (or save changes), print the recipe sheet, download the
// xlsx, start a study from it, delete it.
import { Link } from 'react-router';
import type { SeriesDetail } from '@shared/schemas/buffer-series';
import { Button } from '@/components/ui/button';
import { Spinner } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { recipesXlsxHref } from '../api/recipes-xlsx';

export type DesignerToolbarProps = {
  saved?: SeriesDetail;
  canWrite: boolean;
  locked: boolean;
  valid: boolean;
  changed: boolean;
  pending: boolean;
  hasDesign: boolean;
  saving: boolean;
  onSave: () => void;
  onSaveChanges: () => void;
  onDelete: () => void;
};

const linkButton =
  'inline-flex h-9 items-center rounded border border-line-strong bg-surface px-3.5 font-semibold hover:bg-canvas';

export function DesignerToolbar(p: DesignerToolbarProps) {
  return (
    <div className="sticky top-0 z-10 -mx-2 mb-3 flex items-center justify-between gap-3 border-b border-line bg-canvas/95 px-2 py-2 print:hidden">
      <p className="flex items-center gap-2 text-ink-muted" role="status">
        {p.pending ? (
          <>
            <Spinner /> Designing…
          </>
        ) : !p.valid ? (
          'Fix the fields marked in red to see the design.'
        ) : p.saved && p.changed ? (
          'Changed since it was saved.'
        ) : p.saved ? (
          `Saved, version ${p.saved.version}.`
        ) : p.hasDesign ? (
          'Not saved yet.'
        ) : null}
      </p>
      <div className="flex items-center gap-2">
        {p.canWrite && !p.saved && (
          <Button variant="primary" disabled={!p.valid || !p.hasDesign} onClick={p.onSave}>
            Save series…
          </Button>
        )}
        {p.canWrite && p.saved && !p.locked && (
          <Button
            variant="primary"
            disabled={!p.valid || !p.changed}
            busy={p.saving}
            onClick={p.onSaveChanges}
          >
            Save changes
          </Button>
        )}
        <Button disabled={!p.hasDesign || p.pending} onClick={() => window.print()}>
          Print recipe sheet
        </Button>
        {p.saved && (
          <a href={recipesXlsxHref(p.saved.id)} download className={linkButton}>
            Download xlsx
          </a>
        )}
        {p.canWrite && p.saved && (
          <Link to={paths.studyNew.href({ bufferSeriesId: p.saved.id })} className={linkButton}>
            New study from it
          </Link>
        )}
        {p.canWrite && p.saved && (
          <Button
            onClick={p.onDelete}
            disabled={p.saved.usedBy.length > 0}
            title={p.saved.usedBy.length > 0 ? 'Used by a study' : undefined}
          >
            Delete
          </Button>
        )}
      </div>
    </div>
  );
}
