import { Link } from 'react-router';
import type { StartStep } from '../utils/where-to-start';

export type WhereToStartProps = { steps: StartStep[]; compact?: boolean };

/** Numbered first steps, each with a link to where it is done; `compact` for a side column. */
export function WhereToStart({ steps, compact }: WhereToStartProps) {
  if (compact) {
    return (
      <ol className="divide-y divide-line rounded-md border border-line bg-surface">
        {steps.map((step) => (
          <li key={step.title} className="px-4 py-2">
            <Link to={step.href} className="font-semibold text-accent-700 hover:underline">
              {step.title}
            </Link>
            <p className="text-sm text-ink-muted">{step.text}</p>
          </li>
        ))}
      </ol>
    );
  }
  return (
    <ol className="divide-y divide-line rounded-md border border-line bg-surface">
      {steps.map((step, i) => (
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
