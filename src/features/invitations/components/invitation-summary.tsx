import { roleLabels } from '@shared/permissions';
import type { InvitationView } from '@shared/schemas/api-types';
import { formatDateTime } from '@/lib/format';

export type InvitationSummaryProps = { invitation: InvitationView };

export function InvitationSummary({ invitation }: InvitationSummaryProps) {
  return (
    <dl className="grid grid-cols-[7rem_1fr] gap-x-3 gap-y-1 rounded border border-line bg-canvas px-3 py-2">
      <dt className="text-ink-muted">E-mail</dt>
      <dd className="font-semibold [overflow-wrap:anywhere]">{invitation.email}</dd>
      <dt className="text-ink-muted">Role</dt>
      <dd>{roleLabels[invitation.role]}</dd>
      <dt className="text-ink-muted">Team</dt>
      <dd>{invitation.teamName ?? 'None yet (an admin adds you to a team)'}</dd>
      <dt className="text-ink-muted">Link valid until</dt>
      <dd className="tabular-nums">{formatDateTime(invitation.expiresAt)}</dd>
    </dl>
  );
}
