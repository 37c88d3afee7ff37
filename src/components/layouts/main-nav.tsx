import { NavLink } from 'react-router';
import { can, type Role } from '@shared/permissions';
import { navigation } from '@/config/navigation';

export type MainNavProps = { role: Role };

export function MainNav({ role }: MainNavProps) {
  const entries = navigation.filter((entry) => !entry.permission || can(role, entry.permission));
  return (
    <nav aria-label="Main" className="border-b border-line bg-surface">
      <ul className="mx-auto flex max-w-page gap-1 px-6">
        {entries.map((entry) => (
          <li key={entry.href}>
            <NavLink
              to={entry.href}
              end={entry.end}
              className={({ isActive }) =>
                `-mb-px inline-block border-b-2 px-3 py-2 font-semibold ${
                  isActive
                    ? 'border-accent-700 text-accent-800'
                    : 'border-transparent text-ink-muted hover:text-ink'
                }`
              }
            >
              {entry.label}
            </NavLink>
          </li>
        ))}
      </ul>
    </nav>
  );
}
