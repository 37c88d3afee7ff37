// The brush and the tool: what a click or a dragged rectangle paints (Paint), or only selects
// (Select, then Space or "Apply brush" paints the selection).
import type { WellRole } from '@shared/plate-map/schema';
import { Button } from '@/components/ui/button';
import type { PhPoint, StudyVariant } from '../api/get-study-context';
import type { Brush } from '../utils/brush';
import { roleKeys, wellRoleLabels, wellRoles } from '../utils/roles';
import { RoleGlyph } from './role-glyph';

export type Tool = 'select' | 'paint';

export type BrushBarProps = {
  tool: Tool;
  onToolChange: (tool: Tool) => void;
  brush: Brush;
  onBrushChange: (brush: Brush) => void;
  variants: StudyVariant[];
  phPoints: PhPoint[];
  onApply: () => void;
};

const select = 'h-8 rounded border border-line-strong bg-surface px-1.5 text-ink';
const phLabel = (p: PhPoint) => `pH ${p.pH.toFixed(2)}${p.bufferName ? ` · ${p.bufferName}` : ''}`;

export function BrushBar({
  tool,
  onToolChange,
  brush,
  onBrushChange,
  variants,
  phPoints,
  onApply,
}: BrushBarProps) {
  const pointIndex = brush.point
    ? phPoints.findIndex((p) => p.pH === brush.point!.pH && p.buffer === brush.point!.buffer)
    : -1;
  return (
    <div
      className="flex flex-wrap items-end gap-x-3 gap-y-2 rounded border border-line bg-surface px-3 py-2"
      role="group"
      aria-label="Brush"
    >
      <fieldset>
        <legend className="mb-0.5 text-sm text-ink-muted">Tool</legend>
        <div className="flex overflow-hidden rounded border border-line-strong">
          {(['select', 'paint'] as const).map((t) => (
            <label
              key={t}
              className={`cursor-pointer px-2.5 leading-7 ${tool === t ? 'bg-accent-700 text-white' : 'bg-surface hover:bg-canvas'}`}
            >
              <input
                type="radio"
                name="tool"
                className="sr-only"
                checked={tool === t}
                onChange={() => onToolChange(t)}
              />
              {t === 'select' ? 'Select' : 'Paint'}
            </label>
          ))}
        </div>
      </fieldset>
      <fieldset>
        <legend className="mb-0.5 text-sm text-ink-muted">Role</legend>
        <div className="flex gap-1">
          {wellRoles.map((role: WellRole) => (
            <label
              key={role}
              title={`${wellRoleLabels[role]} (key ${roleKeys[role]})`}
              className={`flex cursor-pointer items-center gap-1 rounded border px-1.5 leading-7 ${brush.role === role ? 'border-accent-600 bg-accent-50 font-semibold' : 'border-line-strong bg-surface hover:bg-canvas'}`}
            >
              <input
                type="radio"
                name="brush-role"
                className="sr-only"
                checked={brush.role === role}
                onChange={() => onBrushChange({ ...brush, role })}
              />
              <RoleGlyph role={role} size={16} />
              <span>{wellRoleLabels[role].replace(' (no enzyme)', '')}</span>
            </label>
          ))}
        </div>
      </fieldset>
      <label className="block">
        <span className="mb-0.5 block text-sm text-ink-muted">Variant</span>
        <select
          className={`${select} max-w-36`}
          aria-label="Brush variant"
          value={brush.variantId ?? ''}
          disabled={brush.role !== 'sample'}
          onChange={(e) => onBrushChange({ ...brush, variantId: e.target.value || undefined })}
        >
          <option value="">Keep</option>
          {variants.map((v) => (
            <option key={v.id} value={v.id}>
              {v.name}
            </option>
          ))}
        </select>
      </label>
      <label className="block">
        <span className="mb-0.5 block text-sm text-ink-muted">pH point</span>
        <select
          className={`${select} max-w-40`}
          aria-label="Brush pH point"
          value={pointIndex}
          onChange={(e) => {
            const p = phPoints[Number(e.target.value)];
            onBrushChange({ ...brush, point: p ? { pH: p.pH, buffer: p.buffer } : undefined });
          }}
        >
          <option value={-1}>Keep</option>
          {phPoints.map((p, i) => (
            <option key={`${p.pH}-${i}`} value={i}>
              {phLabel(p)}
            </option>
          ))}
        </select>
      </label>
      <label className="block">
        <span className="mb-0.5 block text-sm text-ink-muted">Replicate</span>
        <select
          className={select}
          aria-label="Brush replicate"
          value={brush.replicate ?? ''}
          onChange={(e) =>
            onBrushChange({ ...brush, replicate: e.target.value ? Number(e.target.value) : undefined })
          }
        >
          <option value="">Keep</option>
          {Array.from({ length: 12 }, (_, i) => (
            <option key={i} value={i + 1}>
              {i + 1}
            </option>
          ))}
        </select>
      </label>
      {brush.role === 'standard' && (
        <label className="block">
          <span className="mb-0.5 block text-sm text-ink-muted">Standard µM</span>
          <input
            type="number"
            min={0}
            step="any"
            className={`${select} w-24 text-right`}
            aria-label="Brush standard concentration (µM)"
            value={brush.concentrationUm ?? ''}
            onChange={(e) =>
              onBrushChange({
                ...brush,
                concentrationUm: e.target.value === '' ? undefined : Number(e.target.value),
              })
            }
          />
        </label>
      )}
      <Button
        size="sm"
        className="mb-0.5"
        onClick={onApply}
        title="Paint the selected wells with the brush (Space)"
      >
        Apply brush
      </Button>
    </div>
  );
}
