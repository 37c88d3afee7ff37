import { roleLabels, type Role } from '@shared/permissions';
import type { Me } from '@shared/schemas/api-types';

// What each role may do, in PRODUCT.md's words (the server enforces the same table).
const roleSummary: Record<Role, string> = {
  admin: 'Everything; you manage users, teams and the buffer library, and read the audit log.',
  lead: 'Everything a scientist can, in your teams; you review, approve or return studies and compare variants.',
  scientist:
    'You create studies, buffer series and plate maps, upload reads, and run analyses in your teams.',
  viewer: 'You read the studies, profiles and comparisons of your teams and export them; you change nothing.',
};

export type SignedInSummaryProps = { me: Me };

export function SignedInSummary({ me }: SignedInSummaryProps) {
  return (
    <dl className="space-y-3 rounded-md border border-line bg-surface p-5">
      <div>
        <dt className="text-sm text-ink-muted">Role</dt>
        <dd className="font-semibold">{roleLabels[me.role]}</dd>
        <dd className="text-sm text-ink-muted">{roleSummary[me.role]}</dd>
      </div>
      <div>
        <dt className="text-sm text-ink-muted">Teams</dt>
        {me.teams.length === 0 ? (
          <dd className="text-ink-muted">
            {me.role === 'admin'
              ? 'None; as an admin you see every team.'
              : 'None yet. An admin adds you to a team.'}
          </dd>
        ) : (
          me.teams.map((t) => (
            <dd key={t.id} className="font-semibold">
              {t.name}
            </dd>
          ))
        )}
      </div>
    </dl>
  );
}
