import { NavLink } from 'react-router';
import type { TeamSummary } from '@shared/schemas/api-types';
import { paths } from '@/config/paths';

export type TeamListProps = { teams: TeamSummary[]; selectedId: string | null };

export function TeamList({ teams, selectedId }: TeamListProps) {
  return (
    <nav aria-label="Teams">
      <ul className="overflow-hidden rounded-md border border-line bg-surface">
        {teams.map((team) => (
          <li key={team.id} className="border-b border-line last:border-b-0">
            <NavLink
              to={paths.team.href(team.id)}
              aria-current={team.id === selectedId ? 'page' : undefined}
              className={`flex items-baseline justify-between gap-2 border-l-3 px-3 py-2 ${
                team.id === selectedId
                  ? 'border-accent-700 bg-accent-50 font-semibold'
                  : 'border-transparent hover:bg-canvas'
              }`}
            >
              <span>{team.name}</span>
              <span className="text-sm text-ink-muted tabular-nums" title="Members">
                {team.members.length}
              </span>
            </NavLink>
          </li>
        ))}
      </ul>
    </nav>
  );
}
