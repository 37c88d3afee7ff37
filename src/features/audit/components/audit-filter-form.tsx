import { useState, type FormEvent } from 'react';
import { Button } from '@/components/ui/button';
import { SelectField, TextField } from '@/components/ui/field';
import { knownActions, knownEntities, type AuditFilters } from '../utils/audit-filters';

export type AuditFilterFormProps = {
  value: AuditFilters;
  people: { id: string; name: string }[];
  onChange: (filters: AuditFilters) => void;
};

export function AuditFilterForm({ value, people, onChange }: AuditFilterFormProps) {
  const [draft, setDraft] = useState<AuditFilters>(value);
  const set = (key: keyof AuditFilters) => (e: { target: { value: string } }) =>
    setDraft((d) => ({ ...d, [key]: e.target.value || undefined }));
  const submit = (event: FormEvent) => {
    event.preventDefault();
    onChange(draft);
  };
  const clear = () => {
    setDraft({});
    onChange({});
  };
  const datesReversed = Boolean(draft.from && draft.to && draft.from > draft.to);

  return (
    <form
      onSubmit={submit}
      aria-label="Filter the audit log"
      className="no-print mb-4 flex flex-wrap items-start gap-3 rounded-md border border-line bg-surface p-3"
    >
      <TextField
        label="Entity"
        list="audit-entities"
        value={draft.entity ?? ''}
        onChange={set('entity')}
        placeholder="any"
        className="w-40"
      />
      <datalist id="audit-entities">
        {knownEntities.map((e) => (
          <option key={e} value={e} />
        ))}
      </datalist>
      <TextField
        label="Action"
        list="audit-actions"
        value={draft.action ?? ''}
        onChange={set('action')}
        placeholder="any"
        className="w-40"
      />
      <datalist id="audit-actions">
        {knownActions.map((a) => (
          <option key={a} value={a} />
        ))}
      </datalist>
      <SelectField label="Person" value={draft.actorId ?? ''} onChange={set('actorId')} className="w-52">
        <option value="">Anyone</option>
        {people.map((p) => (
          <option key={p.id} value={p.id}>
            {p.name}
          </option>
        ))}
      </SelectField>
      <TextField label="From" type="date" value={draft.from ?? ''} onChange={set('from')} className="w-40" />
      <TextField
        label="To"
        type="date"
        value={draft.to ?? ''}
        onChange={set('to')}
        className="w-40"
        error={datesReversed ? 'Before “From”.' : undefined}
      />
      <div className="flex gap-2 pt-6">
        <Button type="submit" variant="primary" disabled={datesReversed}>
          Apply filters
        </Button>
        <Button onClick={clear}>Clear</Button>
      </div>
    </form>
  );
}
