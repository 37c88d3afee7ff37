// The comparison builder: a team, the profiles (approved studies unless asked otherwise), the
// reference (default: the parent of the first chosen study), an optional global fit, and a live
// preview computed by the server as the choice changes. Saving opens the name-and-notes dialog.
import { useState } from 'react';
import type { SavedComparison } from '@shared/schemas/comparisons';
import { Button } from '@/components/ui/button';
import { QueryError } from '@/components/ui/notice';
import { Loading } from '@/components/ui/spinner';
import { useAvailableProfiles } from '../api/get-profiles';
import { useComparisonPreview } from '../api/preview-comparison';
import {
  effectiveReference,
  toggleProfile,
  toInput,
  withIncludeUnapproved,
  type BuilderState,
} from '../utils/builder-state';
import { BuilderSide } from './builder-side';
import { ComparisonPanel } from './comparison-panel';
import { PreviewStatus } from './preview-status';
import { ProfilePicker } from './profile-picker';
import { SaveComparisonDialog } from './save-comparison-dialog';

export type ComparisonBuilderProps = {
  teams: { id: string; name: string }[];
  initial: BuilderState;
  /** Editing a saved comparison. */
  saved?: Pick<SavedComparison, 'id' | 'version' | 'name' | 'notes'>;
  onSaved: (saved: SavedComparison) => void;
  onReload?: () => void;
};

export function ComparisonBuilder({ teams, initial, saved, onSaved, onReload }: ComparisonBuilderProps) {
  const [state, setState] = useState<BuilderState>(initial);
  const [saving, setSaving] = useState(false);
  const profiles = useAvailableProfiles(
    { teamId: state.teamId || undefined, includeUnapproved: state.includeUnapproved },
    { enabled: Boolean(state.teamId) },
  );
  const available = profiles.data ?? [];
  const input = profiles.data ? toInput(state, available) : null;
  const preview = useComparisonPreview(input);
  const referenceKey = effectiveReference(state, available);

  return (
    <div className="space-y-6">
      <div className="grid grid-cols-[minmax(0,1fr)_22rem] items-start gap-5">
        <section aria-labelledby="profiles-heading">
          <h2 id="profiles-heading" className="mb-2 text-lg">
            Profiles
          </h2>
          {!state.teamId ? (
            <p className="text-ink-muted">Choose the team whose studies you compare.</p>
          ) : profiles.isPending ? (
            <Loading label="Loading the fitted profiles…" />
          ) : profiles.isError ? (
            <QueryError error={profiles.error} what="the profiles" onRetry={() => void profiles.refetch()} />
          ) : (
            <ProfilePicker
              profiles={available}
              selected={state.selected}
              onToggle={(key) => setState((s) => toggleProfile(s, key))}
              onSelectStudy={(keys, on) =>
                setState((s) => ({
                  ...s,
                  selected: on
                    ? [...s.selected, ...keys.filter((k) => !s.selected.includes(k))]
                    : s.selected.filter((k) => !keys.includes(k)),
                }))
              }
            />
          )}
        </section>
        <BuilderSide
          teams={teams}
          state={state}
          profiles={available}
          referenceKey={referenceKey}
          onTeam={(teamId) => setState({ ...state, teamId, selected: [], referenceKey: null })}
          onIncludeUnapproved={(on) => setState((s) => withIncludeUnapproved(s, on, available))}
          onReference={(key) => setState((s) => ({ ...s, referenceKey: key }))}
          onGlobalFit={(globalFit) => setState((s) => ({ ...s, globalFit }))}
          actions={
            <Button variant="primary" disabled={!input || preview.isError} onClick={() => setSaving(true)}>
              {saved ? 'Save changes…' : 'Save comparison…'}
            </Button>
          }
        />
      </div>
      <section aria-labelledby="preview-heading">
        <div className="mb-2 flex items-center gap-3">
          <h2 id="preview-heading" className="text-lg">
            Preview
          </h2>
          <PreviewStatus fetching={preview.isFetching} />
        </div>
        {!input ? (
          <p className="rounded border border-dashed border-line-strong px-4 py-8 text-center text-ink-muted">
            Choose profiles above: the curves and the table appear here.
          </p>
        ) : preview.isError ? (
          <QueryError error={preview.error} what="the comparison" onRetry={() => void preview.refetch()} />
        ) : !preview.data ? (
          <Loading label="Comparing the profiles…" />
        ) : (
          <ComparisonPanel view={preview.data} />
        )}
      </section>
      {saving && input && (
        <SaveComparisonDialog
          open
          onClose={() => setSaving(false)}
          input={input}
          saved={saved}
          onSaved={(s) => {
            setSaving(false);
            onSaved(s);
          }}
          onReload={onReload}
        />
      )}
    </div>
  );
}
