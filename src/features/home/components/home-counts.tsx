// The counts at the top of the home page, each a link to where the items are listed.
import type { HomeView } from '@shared/schemas/home';

export type HomeCountsProps = {
  counts: HomeView['counts'];
  showDrafts: boolean;
  showReview: boolean;
  /** Admins see every team. */
  allTeams: boolean;
};

export function HomeCounts({ counts, showDrafts, showReview, allTeams }: HomeCountsProps) {
  const where = allTeams ? 'in all teams' : 'in my teams';
  const tiles = [
    ...(showReview
      ? [
          {
            id: 'review',
            label: 'Awaiting my review',
            value: counts.awaitingReview,
            strong: counts.awaitingReview > 0,
          },
        ]
      : []),
    ...(showDrafts ? [{ id: 'drafts', label: 'Drafts of mine', value: counts.myDrafts, strong: false }] : []),
    { id: 'approved', label: `Approved ${where}`, value: counts.approved, strong: false },
    { id: 'uploads', label: 'Recent uploads', value: counts.uploads, strong: false },
    { id: 'studies', label: `Studies ${where}`, value: counts.studies, strong: false },
  ];
  return (
    <ul aria-label="Counts" className="mb-6 grid grid-cols-[repeat(auto-fit,minmax(11rem,1fr))] gap-3">
      {tiles.map((t) => (
        <li
          key={t.id}
          className={`rounded border px-4 py-2.5 ${t.strong ? 'border-accent-300 bg-accent-50' : 'border-line bg-surface'}`}
        >
          <p className="text-2xl leading-tight font-semibold tabular-nums">{t.value}</p>
          <p className="text-sm text-ink-muted">{t.label}</p>
        </li>
      ))}
    </ul>
  );
}
