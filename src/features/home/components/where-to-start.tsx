import { Link } from 'react-router';
import type { Role } from '@shared/permissions';
import { whereToStart } from '../utils/where-to-start';

export type WhereToStartProps = { role: Role };

export function WhereToStart({ role }: WhereToStartProps) {
  return (
    <ol className="divide-y divide-line rounded-md border border-line bg-surface">
      {whereToStart(role).map((step, i) => (
        <li key={step.title} className="flex gap-4 px-5 py-3">
          <span className="mt-0.5 flex size-6 shrink-0 items-center justify-center rounded-full bg-accent-50 text-sm font-bold text-accent-800">
            {i + 1}
          </span>
          <div className="flex-1">
            <p className="font-semibold">{step.title}</p>
            <p className="text-ink-muted">{step.text}</p>
          </div>
          <Link
            to={step.href}
            className="self-center font-semibold whitespace-nowrap text-accent-700 underline"
          >
            {step.linkLabel}
          </Link>
        </li>
      ))}
    </ol>
  );
}
