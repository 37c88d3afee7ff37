import type { ReactNode } from 'react';

const tones = {
  neutral: 'border-line-strong bg-canvas text-ink-muted',
  accent: 'border-accent-200 bg-accent-50 text-accent-800',
  warning: 'border-warn-200 bg-warn-50 text-warn-800',
} as const;

export type BadgeProps = { tone?: keyof typeof tones; children: ReactNode };

export function Badge({ tone = 'neutral', children }: BadgeProps) {
  return (
    <span
      className={`inline-flex items-center rounded border px-1.5 text-sm leading-5 font-semibold ${tones[tone]}`}
    >
      {children}
    </span>
  );
}
