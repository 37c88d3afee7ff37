// The Analysis tab of a study: provenance, the bootstrap, notes, and five views (profiles with the
// parameter table, wells with time courses, exclusions, plate QC, settings). Editors change windows,
// exclusions and settings; the page refits at once from the server's answer. Read-only for viewers
// and while the study is in review or approved.
import type { StudyAnalysis } from '@shared/schemas/analysis';
import { Notice } from '@/components/ui/notice';
import { useAnalysisParams } from '../hooks/use-analysis-params';
import { BootstrapControl } from './bootstrap-control';
import { ExclusionsPanel } from './exclusions-panel';
import { FrozenBanner } from './frozen-banner';
import { ParameterTable } from './parameter-table';
import { ProfilePanel } from './profile-panel';
import { ProvenanceLine } from './provenance-line';
import { QcPanel } from './qc-panel';
import { SettingsPanel } from './settings-panel';
import { ProfilePicker } from './variant-picker';
import { ViewSwitch } from './view-switch';
import { WellsPanel } from './wells-panel';

export type AnalysisScreenProps = {
  analysis: StudyAnalysis;
  enzymeId: string;
  /** The user may write and the study is a draft or returned. */
  editable: boolean;
  /** Why nothing can be changed here (role or status), or null when editable. */
  readOnlyReason: string | null;
  onReload: () => void;
  reloading: boolean;
};

export function AnalysisScreen({
  analysis,
  enzymeId,
  editable,
  readOnlyReason,
  onReload,
  reloading,
}: AnalysisScreenProps) {
  const params = useAnalysisParams();
  const { result } = analysis;
  const kinetic = result.wells.some((w) => w.window !== null);
  const plateNames = Object.fromEntries(result.qc.plates.map((p) => [p.plateId, p.name]));
  const selected =
    result.profiles.find((p) => p.variantId === params.variant) ??
    result.profiles.find((p) => p.isReference) ??
    result.profiles[0];
  const active = analysis.exclusions.filter((e) => !e.liftedAt).length;
  const qcFlags = result.qc.plates.reduce((n, p) => n + p.flags.length, 0);

  return (
    <div className="space-y-4">
      {analysis.frozen ? (
        <FrozenBanner analysis={analysis} readOnlyReason={readOnlyReason} />
      ) : (
        readOnlyReason && (
          <p className="flex items-center gap-2 text-sm text-ink-muted" role="note">
            <svg viewBox="0 0 12 12" className="size-3.5 shrink-0" aria-hidden="true">
              <path
                d="M3.5 5V3.8a2.5 2.5 0 0 1 5 0V5M2.5 5h7v5.5h-7z"
                fill="none"
                stroke="currentColor"
                strokeWidth="1.3"
              />
            </svg>
            <span>
              <span className="font-semibold text-ink">Read-only.</span> {readOnlyReason}
            </span>
          </p>
        )
      )}
      <div className="space-y-1">
        <ProvenanceLine analysis={analysis} />
        <p className="text-sm">{result.units.note}</p>
        <BootstrapControl analysis={analysis} editable={editable} />
      </div>
      {result.notes.map((n) => (
        <Notice key={n.code} tone={n.level === 'warning' ? 'warning' : 'info'}>
          {n.message}
        </Notice>
      ))}
      <ViewSwitch
        view={params.view}
        counts={{ exclusions: active, qc: qcFlags }}
        countWords={{ exclusions: 'in force', qc: 'flags' }}
        onChange={(view) => params.set({ view })}
      />

      {params.view === 'profiles' && (
        <div className="space-y-5">
          <ParameterTable
            profiles={result.profiles}
            activityUnit={result.units.activity}
            bootstrapCurrent={analysis.bootstrap.current}
            selectedVariantId={selected?.variantId ?? null}
            onSelect={(variant) => params.set({ variant })}
          />
          {selected ? (
            <>
              <ProfilePicker
                profiles={result.profiles}
                selected={selected.variantId}
                onSelect={(variant) => params.set({ variant })}
              />
              <ProfilePanel
                profile={selected}
                wells={result.wells}
                units={result.units}
                plateNames={plateNames}
                bootstrapCurrent={analysis.bootstrap.current}
                flagText={result.flagText}
              />
            </>
          ) : (
            <Notice>No variant has a profile yet.</Notice>
          )}
        </div>
      )}
      {params.view === 'wells' && (
        <WellsPanel
          analysis={analysis}
          editable={editable}
          kinetic={kinetic}
          plateId={params.plate}
          well={params.well}
          onPick={(change) => params.set(change)}
          onReload={onReload}
          reloading={reloading}
        />
      )}
      {params.view === 'exclusions' && (
        <ExclusionsPanel
          analysis={analysis}
          editable={editable}
          onShowWell={(plate, well) => params.set({ view: 'wells', plate, well })}
        />
      )}
      {params.view === 'qc' && <QcPanel analysis={analysis} />}
      {params.view === 'settings' && (
        <SettingsPanel
          key={analysis.settingsVersion}
          analysis={analysis}
          enzymeId={enzymeId}
          editable={editable}
          kinetic={kinetic}
          onReload={onReload}
          reloading={reloading}
        />
      )}
    </div>
  );
}
