// A buffer system's page: every ionization with its sources, the forms, the cautions and notes,
// and what each cited source key means.
import type { BufferDetail } from '@shared/schemas/buffers-types';
import { Notice } from '@/components/ui/notice';
import { citedKeys } from '../utils/sources';
import { FormsTable } from './forms-table';
import { IonizationCard } from './ionization-card';

export type BufferDetailsProps = { buffer: BufferDetail };

export function BufferDetails({ buffer }: BufferDetailsProps) {
  const { system } = buffer;
  const keys = citedKeys(system);
  return (
    <div className="space-y-6">
      {system.cautions.length > 0 && (
        <Notice tone="warning" title="Cautions">
          <ul className="list-disc pl-4">
            {system.cautions.map((c) => (
              <li key={c}>{c}</li>
            ))}
          </ul>
        </Notice>
      )}
      <section aria-labelledby="ionizations-heading">
        <h2 id="ionizations-heading" className="mb-2 text-lg">
          Ionizations ({system.ionizations.length})
        </h2>
        <div className={system.ionizations.length > 1 ? 'grid grid-cols-2 gap-4' : 'max-w-3xl'}>
          {system.ionizations.map((ion, i) => (
            <IonizationCard key={ion.label} ion={ion} summary={buffer.steps[i]} forms={system.forms} />
          ))}
        </div>
      </section>
      <section aria-labelledby="forms-heading">
        <h2 id="forms-heading" className="mb-2 text-lg">
          Forms
        </h2>
        <FormsTable forms={system.forms} systemName={system.name} />
      </section>
      {system.notes.length > 0 && (
        <section aria-labelledby="notes-heading">
          <h2 id="notes-heading" className="mb-1 text-lg">
            Notes
          </h2>
          <ul className="list-disc space-y-1 pl-5">
            {system.notes.map((n) => (
              <li key={n}>{n}</li>
            ))}
          </ul>
        </section>
      )}
      {keys.length > 0 && (
        <section aria-labelledby="sources-heading">
          <h2 id="sources-heading" className="mb-1 text-lg">
            Sources cited
          </h2>
          <dl className="grid grid-cols-[8rem_1fr] gap-x-4 gap-y-1 text-sm">
            {keys.map((k) => (
              <div key={k.key} className="contents">
                <dt className="font-semibold">{k.key}</dt>
                <dd className="text-ink-muted">{k.meaning}</dd>
              </div>
            ))}
          </dl>
        </section>
      )}
    </div>
  );
}
