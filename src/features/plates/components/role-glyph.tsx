// The role's shape on its own (for the legend and the brush), drawn like the wells draw it.
import type { WellRole } from '@shared/plate-map/schema';

export type RoleGlyphProps = { role: WellRole; size?: number; color?: string };

export function RoleGlyph({ role, size = 18, color = '#4f5a5c' }: RoleGlyphProps) {
  const c = size / 2;
  const r = size / 2 - 1.5;
  const d = r * 0.62;
  return (
    <svg width={size} height={size} viewBox={`0 0 ${size} ${size}`} aria-hidden="true" className="shrink-0">
      {role === 'sample' && <circle cx={c} cy={c} r={r} fill={color} />}
      {role === 'blank' && <circle cx={c} cy={c} r={r - 1} fill="#fff" stroke={color} strokeWidth={2.4} />}
      {role === 'buffer' && (
        <circle
          cx={c}
          cy={c}
          r={r - 1}
          fill="#fff"
          stroke={color}
          strokeWidth={2.4}
          strokeDasharray="2.6 1.8"
        />
      )}
      {role === 'standard' && (
        <rect
          x={c - r}
          y={c - r}
          width={2 * r}
          height={2 * r}
          rx={1.5}
          fill="#e4e8e6"
          stroke={color}
          strokeWidth={1.3}
        />
      )}
      {role === 'unused' && (
        <g>
          <circle cx={c} cy={c} r={r} fill="#eef0ee" stroke="#b9c1bd" />
          <path
            d={`M${c - d} ${c - d}L${c + d} ${c + d}M${c + d} ${c - d}L${c - d} ${c + d}`}
            stroke="#9aa3a1"
            strokeWidth={1.2}
          />
        </g>
      )}
    </svg>
  );
}
