// The builder's side column: the team, whether unapproved studies may be included, the reference
// profile, the global-fit option and the save button.
import { useId, type ReactNode } from 'react';
import { entryKey } from '@shared/comparison/compare';
import type { AvailableProfile } from '@shared/schemas/comparisons';
import { SelectField } from '@/components/ui/field';
import type { BuilderState, GlobalFitChoice } from '../utils/builder-state';
import { GlobalFitControls } from './global-fit-controls';

export type BuilderSideProps = {
  teams: { id: string; name: string }[];
  state: BuilderState;
  profiles: AvailableProfile[];
  referenceKey: string | null;
  onTeam: (teamId: string) => void;
  onIncludeUnapproved: (on: boolean) => void;
  onReference: (key: string) => void;
  onGlobalFit: (value: GlobalFitChoice | null) => void;
  actions: ReactNode;
};

export function BuilderSide(props: BuilderSideProps) {
  const { teams, state, profiles, referenceKey } = props;
  const unapprovedId = useId();
  const chosen = state.selected.flatMap((key) => {
    const p = profiles.find((x) => entryKey(x) === key);
    return p ? [p] : [];
  });
  return (
    <aside aria-label="Comparison settings" className="space-y-4">
      {teams.length === 1 ? (
        <p>
          <span className="text-ink-muted">Team:</span> <span className="font-semibold">{teams[0].name}</span>
        </p>
      ) : (
        <SelectField label="Team" value={state.teamId} onChange={(e) => props.onTeam(e.target.value)}>
          <option value="">Choose a team…</option>
          {teams.map((t) => (
            <option key={t.id} value={t.id}>
              {t.name}
            </option>
          ))}
        </SelectField>
      )}
      <div>
        <label htmlFor={unapprovedId} className="flex items-center gap-2">
          <input
            id={unapprovedId}
            type="checkbox"
            className="size-4 accent-accent-700"
            checked={state.includeUnapproved}
            onChange={(e) => props.onIncludeUnapproved(e.target.checked)}
          />
          Include studies not yet approved
        </label>
        <p className="mt-0.5 pl-6 text-sm text-ink-muted">
          Their fits may still change; they are marked “not approved” everywhere.
        </p>
      </div>
      <SelectField
        label="Reference profile"
        value={referenceKey ?? ''}
        disabled={chosen.length === 0}
        hint="Differences are taken to this profile. By default the parent of the first chosen study."
        onChange={(e) => props.onReference(e.target.value)}
      >
        {chosen.length === 0 && <option value="">Choose profiles first</option>}
        {chosen.map((p) => (
          <option key={entryKey(p)} value={entryKey(p)}>
            {p.variantName} — {p.studyName}
            {p.approved ? '' : ' (not approved)'}
          </option>
        ))}
      </SelectField>
      <GlobalFitControls value={state.globalFit} onChange={props.onGlobalFit} profiles={chosen.length} />
      <div className="flex gap-2">{props.actions}</div>
    </aside>
  );
}
