import { roleLabels } from '@shared/permissions';
import type { Me } from '@shared/schemas/api-types';
import { listOf } from '@/lib/format';

export type AccountDetailsProps = { me: Me };

export function AccountDetails({ me }: AccountDetailsProps) {
  return (
    <dl className="grid grid-cols-[8rem_1fr] gap-x-4 gap-y-2">
      <dt className="text-ink-muted">Name</dt>
      <dd className="font-semibold">{me.name}</dd>
      <dt className="text-ink-muted">E-mail</dt>
      <dd>{me.email}</dd>
      <dt className="text-ink-muted">Role</dt>
      <dd>{roleLabels[me.role]}</dd>
      <dt className="text-ink-muted">Teams</dt>
      <dd>
        {listOf(
          me.teams.map((t) => t.name),
          'None',
        )}
      </dd>
    </dl>
  );
}
