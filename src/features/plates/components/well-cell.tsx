// One well of the plate map, drawn in SVG and memoised: a paint re-renders only the wells whose
// assignment or selection changed. Shape and letter say the role; the fill colour says the pH.
import { memo } from 'react';
import type { WellAssignment } from '@shared/plate-map/schema';
import { inkOnPh, phColor } from '@/components/ui/ph-scale';
import { roleKeys, wellRoleLabels } from '../utils/roles';

export type WellCellProps = {
  id: string;
  name: string;
  x: number;
  y: number;
  w: number;
  h: number;
  well: WellAssignment | undefined;
  tag: string | null;
  variantName: string | null;
  selected: boolean;
  cursor: boolean;
  highlighted: boolean;
  compact: boolean;
};

const INK = '#1b2224';
const MUTED = '#4f5a5c';
const EMPTY_STROKE = '#b9c1bd';
const NO_PH = '#9aa3a1';

export function describeWell(
  name: string,
  well: WellAssignment | undefined,
  variantName: string | null,
): string {
  if (!well) return `${name}, no role`;
  const parts = [name, wellRoleLabels[well.role]];
  if (variantName) parts.push(variantName);
  if (well.pH != null) parts.push(`pH ${well.pH}`);
  if (well.buffer) parts.push(well.buffer);
  if (well.replicate != null) parts.push(`replicate ${well.replicate}`);
  if (well.concentrationUm != null) parts.push(`${well.concentrationUm} µM`);
  return parts.join(', ');
}

function Shape({ well, cx, cy, r }: { well: WellAssignment | undefined; cx: number; cy: number; r: number }) {
  if (!well) return <circle cx={cx} cy={cy} r={r} fill="#ffffff" stroke={EMPTY_STROKE} />;
  const ph = well.pH == null ? NO_PH : phColor(well.pH);
  switch (well.role) {
    case 'sample':
      return <circle cx={cx} cy={cy} r={r} fill={ph} />;
    case 'blank':
      return <circle cx={cx} cy={cy} r={r - 1.5} fill="#ffffff" stroke={ph} strokeWidth={3} />;
    case 'buffer':
      return (
        <circle
          cx={cx}
          cy={cy}
          r={r - 1.5}
          fill="#ffffff"
          stroke={ph}
          strokeWidth={3}
          strokeDasharray="3.2 2.2"
        />
      );
    case 'standard':
      return (
        <rect
          x={cx - r}
          y={cy - r}
          width={2 * r}
          height={2 * r}
          rx={2}
          fill="#e4e8e6"
          stroke={well.pH == null ? MUTED : ph}
          strokeWidth={1.5}
        />
      );
    case 'unused': {
      const d = r * 0.62;
      return (
        <g>
          <circle cx={cx} cy={cy} r={r} fill="#eef0ee" stroke={EMPTY_STROKE} />
          <path
            d={`M${cx - d} ${cy - d}L${cx + d} ${cy + d}M${cx + d} ${cy - d}L${cx - d} ${cy + d}`}
            stroke={NO_PH}
            strokeWidth={1.2}
          />
        </g>
      );
    }
  }
}

function centreText(well: WellAssignment, tag: string | null, compact: boolean): string {
  if (well.role === 'sample') return tag ? (compact ? tag.slice(0, 4) : tag) : '?';
  if (well.role === 'standard' && well.concentrationUm != null && !compact)
    return String(well.concentrationUm);
  if (well.role === 'unused') return '';
  return roleKeys[well.role];
}

function WellCellImpl(props: WellCellProps) {
  const { id, name, x, y, w, h, well, tag, selected, cursor, highlighted, compact } = props;
  const cx = w / 2;
  const cy = h / 2;
  const r = Math.min(w, h) / 2 - (compact ? 1.5 : 3);
  const onFill = well?.role === 'sample' && well.pH != null ? inkOnPh(well.pH) : INK;
  const centre = well ? centreText(well, tag, compact) : '';
  return (
    <g
      role="gridcell"
      id={id}
      data-well={name}
      aria-label={describeWell(name, well, props.variantName)}
      aria-selected={selected}
      transform={`translate(${x},${y})`}
    >
      {selected && <rect x={0.5} y={0.5} width={w - 1} height={h - 1} fill="#acd5d0" />}
      <Shape well={well} cx={cx} cy={cy} r={r} />
      {centre && (
        <text
          x={cx}
          y={compact || well?.pH == null || well.role === 'standard' ? cy + 3.5 : cy + 1}
          textAnchor="middle"
          fontSize={compact ? 8 : centre.length > 5 ? 9 : 10.5}
          fontWeight={600}
          fill={onFill}
        >
          {centre}
        </text>
      )}
      {!compact && well && well.pH != null && well.role !== 'standard' && (
        <text x={cx} y={cy + 11.5} textAnchor="middle" fontSize={8.5} fill={onFill}>
          {well.pH.toFixed(well.pH * 10 === Math.round(well.pH * 10) ? 1 : 2)}
        </text>
      )}
      {!compact && well?.replicate != null && (
        <text x={w - 3} y={9} textAnchor="end" fontSize={8.5} fill={MUTED}>
          {well.replicate}
        </text>
      )}
      {highlighted && (
        <rect
          x={1.5}
          y={1.5}
          width={w - 3}
          height={h - 3}
          fill="none"
          stroke="#a86d00"
          strokeWidth={2}
          strokeDasharray="4 2"
        />
      )}
      {cursor && <rect x={1} y={1} width={w - 2} height={h - 2} fill="none" stroke={INK} strokeWidth={2} />}
    </g>
  );
}

export const WellCell = memo(WellCellImpl);
