// The rows of the settings panel: per variant (model, preparation) and per plate (read).
import type { Preparation } from '@shared/schemas/records-types';
import type { ReadSummary } from '@shared/schemas/plates-types';
import { MODEL_IDS } from '@shared/fitting';
import { formatDate } from '@/lib/format';
import { usePlateReads } from '../api/get-plate-reads';
import { modelWords } from '../utils/models';

const select =
  'h-8 w-full rounded border border-line-strong bg-surface px-2 disabled:bg-canvas disabled:text-ink-muted';

export type VariantSettingsRowProps = {
  name: string;
  model: string;
  preparation: string;
  preparations: Preparation[] | undefined;
  disabled: boolean;
  onModel: (model: string) => void;
  onPreparation: (id: string) => void;
};

export function VariantSettingsRow(p: VariantSettingsRowProps) {
  return (
    <tr>
      <th scope="row" className="px-2 py-1 text-left font-semibold">
        {p.name}
      </th>
      <td className="px-2 py-1">
        <select
          aria-label={`Model for ${p.name}`}
          className={select}
          value={p.model}
          disabled={p.disabled}
          onChange={(e) => p.onModel(e.target.value)}
        >
          <option value="auto">Automatic (simplest adequate model)</option>
          {MODEL_IDS.map((m) => (
            <option key={m} value={m}>
              {modelWords[m]}
            </option>
          ))}
        </select>
      </td>
      <td className="px-2 py-1">
        <select
          aria-label={`Preparation of ${p.name}`}
          className={select}
          value={p.preparation}
          disabled={p.disabled || !p.preparations}
          onChange={(e) => p.onPreparation(e.target.value)}
        >
          <option value="">Newest preparation</option>
          {(p.preparations ?? []).map((prep) => (
            <option key={prep.id} value={prep.id}>
              {prep.lot}: {prep.proteinMgPerMl} mg/mL, {formatDate(prep.preparedOn)}
            </option>
          ))}
        </select>
        {p.preparations && p.preparations.length === 0 && (
          <p className="text-xs text-ink-muted">No preparation recorded: no specific activity.</p>
        )}
      </td>
    </tr>
  );
}

export type PlateReadRowProps = {
  plateId: string;
  name: string;
  read: string;
  /** The assay's read mode: only reads of that kind are offered (a read of the other kind cannot be analysed). */
  kind: 'kinetic' | 'endpoint';
  disabled: boolean;
  onRead: (id: string) => void;
};

const readLabel = (r: ReadSummary) => `${r.label || r.fileName} (${r.kind}, ${formatDate(r.uploadedAt)})`;

export function PlateReadRow({ plateId, name, read, kind, disabled, onRead }: PlateReadRowProps) {
  const reads = usePlateReads(plateId);
  const usable = (reads.data ?? []).filter((r) => r.kind === kind);
  return (
    <tr>
      <th scope="row" className="px-2 py-1 text-left font-semibold">
        {name}
      </th>
      <td className="px-2 py-1">
        <select
          aria-label={`Read used for ${name}`}
          className={select}
          value={read}
          disabled={disabled || !reads.data}
          onChange={(e) => onRead(e.target.value)}
        >
          <option value="">Newest read of the assay’s read mode</option>
          {usable.map((r) => (
            <option key={r.id} value={r.id}>
              {readLabel(r)}
            </option>
          ))}
        </select>
        {reads.isError && <p className="text-xs text-danger-600">{reads.error.message}</p>}
        {reads.data && usable.length < reads.data.length && (
          <p className="text-xs text-ink-muted">
            {reads.data.length - usable.length} {kind === 'kinetic' ? 'end-point' : 'kinetic'} read(s) not
            offered: the assay reads {kind === 'kinetic' ? 'kinetically' : 'end points'}.
          </p>
        )}
      </td>
    </tr>
  );
}
