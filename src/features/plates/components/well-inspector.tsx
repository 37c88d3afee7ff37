// The inspector: what the selected wells hold, and fields that change all of them at once
// (each change is one undo step). "mixed" means the selected wells differ.
import type { PlateMap, WellRole } from '@shared/plate-map/schema';
import type { PhPoint, StudyVariant } from '../api/get-study-context';
import { common, type WellPatch } from '../utils/edit-map';
import { wellRoleLabels, wellRoles } from '../utils/roles';
import { CommitInput } from './commit-input';

export type WellInspectorProps = {
  map: PlateMap;
  names: string[];
  variants: StudyVariant[];
  phPoints: PhPoint[];
  readOnly: boolean;
  onPatch: (patch: WellPatch) => void;
  onClear: () => void;
};

const select =
  'h-8 w-full rounded border border-line-strong bg-surface px-1.5 disabled:bg-canvas disabled:text-ink-muted';

function selectionLabel(names: string[]) {
  if (names.length === 1) return `Well ${names[0]}`;
  return `${names.length} wells (${names[0]} … ${names[names.length - 1]})`;
}

export function WellInspector({
  map,
  names,
  variants,
  phPoints,
  readOnly,
  onPatch,
  onClear,
}: WellInspectorProps) {
  const role = common(map, names, 'role');
  const variantId = common(map, names, 'variantId');
  const pH = common(map, names, 'pH');
  const buffer = common(map, names, 'buffer');
  const replicate = common(map, names, 'replicate');
  const conc = common(map, names, 'concentrationUm');
  const empty = names.every((n) => !map.wells[n]);
  const pointIndex =
    typeof pH === 'number' && buffer !== 'mixed'
      ? phPoints.findIndex((p) => p.pH === pH && p.buffer === (buffer ?? null))
      : -1;
  const roleValue = empty ? 'none' : role === 'mixed' || role === undefined ? 'mixed' : role;
  const disabled = readOnly || empty;

  return (
    <section aria-labelledby="inspector-title" className="rounded border border-line bg-surface p-3">
      <h2 id="inspector-title" className="text-base">
        {selectionLabel(names)}
      </h2>
      <div className="mt-2 grid grid-cols-2 gap-x-3 gap-y-2">
        <label className="col-span-2 block">
          <span className="mb-0.5 block text-sm text-ink-muted">Role</span>
          <select
            className={select}
            value={roleValue}
            disabled={readOnly}
            onChange={(e) =>
              e.target.value === 'none' ? onClear() : onPatch({ role: e.target.value as WellRole })
            }
          >
            {roleValue === 'mixed' && <option value="mixed">(mixed)</option>}
            <option value="none">No role</option>
            {wellRoles.map((r) => (
              <option key={r} value={r}>
                {wellRoleLabels[r]}
              </option>
            ))}
          </select>
        </label>
        <label className="col-span-2 block">
          <span className="mb-0.5 block text-sm text-ink-muted">Variant</span>
          <select
            className={select}
            value={variantId === 'mixed' ? 'mixed' : (variantId ?? '')}
            disabled={disabled || role !== 'sample'}
            onChange={(e) => onPatch({ variantId: e.target.value || null })}
          >
            {variantId === 'mixed' && <option value="mixed">(mixed)</option>}
            <option value="">None</option>
            {variants.map((v) => (
              <option key={v.id} value={v.id}>
                {v.name}
              </option>
            ))}
            {typeof variantId === 'string' &&
              variantId !== 'mixed' &&
              !variants.some((v) => v.id === variantId) && (
                <option value={variantId}>Not in this study</option>
              )}
          </select>
        </label>
        <label className="col-span-2 block">
          <span className="mb-0.5 block text-sm text-ink-muted">pH point of the buffer series</span>
          <select
            className={select}
            value={pointIndex >= 0 ? pointIndex : pH === 'mixed' ? 'mixed' : 'other'}
            disabled={disabled || phPoints.length === 0}
            onChange={(e) => {
              const p = phPoints[Number(e.target.value)];
              if (p) onPatch({ pH: p.pH, buffer: p.buffer });
            }}
          >
            {pH === 'mixed' && <option value="mixed">(mixed)</option>}
            {pointIndex < 0 && pH !== 'mixed' && (
              <option value="other">{pH == null ? 'None' : 'Not a series point'}</option>
            )}
            {phPoints.map((p, i) => (
              <option key={`${p.pH}-${i}`} value={i}>
                pH {p.pH.toFixed(2)}
                {p.bufferName ? ` · ${p.bufferName}` : ''}
              </option>
            ))}
          </select>
        </label>
        <CommitInput
          label="pH"
          value={pH}
          min={0}
          max={14}
          disabled={disabled}
          onCommit={(v) => onPatch({ pH: v })}
        />
        <label className="block">
          <span className="mb-0.5 block text-sm text-ink-muted">Buffer</span>
          <input
            key={String(buffer)}
            className={`${select} px-2`}
            defaultValue={buffer === 'mixed' ? '' : (buffer ?? '')}
            placeholder={buffer === 'mixed' ? 'mixed' : ''}
            disabled={disabled}
            maxLength={60}
            onBlur={(e) => {
              const v = e.target.value.trim() || null;
              const changed = buffer === 'mixed' ? v !== null : v !== (buffer ?? null);
              if (changed) onPatch({ buffer: v });
            }}
            onKeyDown={(e) => e.key === 'Enter' && e.currentTarget.blur()}
          />
        </label>
        <CommitInput
          label="Replicate"
          value={replicate}
          integer
          min={1}
          max={99}
          disabled={disabled}
          onCommit={(v) => onPatch({ replicate: v })}
        />
        <CommitInput
          label="Standard"
          unit="µM"
          value={conc}
          min={0}
          max={1e7}
          disabled={disabled || role !== 'standard'}
          onCommit={(v) => onPatch({ concentrationUm: v })}
        />
      </div>
      {empty && !readOnly && (
        <p className="mt-2 text-sm text-ink-muted">Give the wells a role first (a role key or the brush).</p>
      )}
    </section>
  );
}
