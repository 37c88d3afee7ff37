import type { AuditEntry } from '@shared/schemas/api-types';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { formatDateTimeSeconds } from '@/lib/format';

export type AuditEntryDialogProps = { entry: AuditEntry | null; onClose: () => void };

function Json({ title, value }: { title: string; value: unknown }) {
  return (
    <section aria-label={title} className="min-w-0">
      <h3 className="mb-1 text-sm text-ink-muted">{title}</h3>
      <pre className="max-h-[50vh] overflow-auto rounded border border-line bg-canvas p-3 font-mono text-sm leading-5">
        {value === null || value === undefined ? '(nothing)' : JSON.stringify(value, null, 2)}
      </pre>
    </section>
  );
}

export function AuditEntryDialog({ entry, onClose }: AuditEntryDialogProps) {
  return (
    <Dialog
      open={entry !== null}
      onClose={onClose}
      width="lg"
      title={entry ? `${entry.entity} · ${entry.action}` : ''}
      description={
        entry && (
          <span className="tabular-nums">
            {formatDateTimeSeconds(entry.at)} by {entry.actor?.name ?? 'the system'}
            {entry.entityId && (
              <>
                {' '}
                · id <span className="font-mono text-sm">{entry.entityId}</span>
              </>
            )}
            {entry.teamId && (
              <>
                {' '}
                · team <span className="font-mono text-sm">{entry.teamId}</span>
              </>
            )}
          </span>
        )
      }
      footer={<Button onClick={onClose}>Close</Button>}
    >
      {entry && (
        <div className="grid grid-cols-2 gap-4">
          <Json title="Before" value={entry.before} />
          <Json title="After" value={entry.after} />
        </div>
      )}
    </Dialog>
  );
}
