// The legend of the plate map: role shapes and keys, the pH colour scale, variant labels.
import { PhLegend } from '@/components/ui/ph-legend';
import type { StudyVariant } from '../api/get-study-context';
import { roleHints, roleKeys, wellRoleLabels, wellRoles } from '../utils/roles';
import { RoleGlyph } from './role-glyph';

export type MapLegendProps = {
  variants: StudyVariant[];
  tags: Record<string, string>;
  phRange: [number, number];
  /** The wells show variant numbers (v1, v2…) instead of labels (small 384-well cells). */
  numbered?: boolean;
};

export function MapLegend({ variants, tags, phRange, numbered }: MapLegendProps) {
  return (
    <section aria-label="Legend" className="flex flex-wrap items-start gap-x-8 gap-y-3 text-sm">
      <ul className="grid grid-cols-[auto_auto] gap-x-4 gap-y-0.5" aria-label="Roles">
        {wellRoles.map((role) => (
          <li key={role} className="flex items-center gap-1.5" title={roleHints[role]}>
            <RoleGlyph role={role} size={16} />
            <span>
              {wellRoleLabels[role]}{' '}
              <kbd className="rounded border border-line-strong px-1 text-xs">{roleKeys[role]}</kbd>
            </span>
          </li>
        ))}
        <li className="flex items-center gap-1.5">
          <svg width={16} height={16} aria-hidden="true">
            <circle cx={8} cy={8} r={6.5} fill="#fff" stroke="#b9c1bd" />
          </svg>
          No role
        </li>
      </ul>
      <div>
        <PhLegend
          min={phRange[0]}
          max={phRange[1]}
          width={200}
          step={phRange[1] - phRange[0] > 6 ? 2 : 1}
          title="Fill: pH"
        />
        <p className="text-ink-muted">Grey fill: no pH. Small number top right: replicate.</p>
      </div>
      {variants.length > 0 && numbered && (
        <p className="max-w-40 text-ink-muted">Sample wells show the variant's number.</p>
      )}
      {variants.length > 0 && (
        <ul aria-label="Variants" className="grid grid-cols-[auto_auto_auto] gap-x-2">
          {variants.map((v, i) => (
            <li key={v.id} className="contents">
              <span
                className="text-right text-ink-muted tabular-nums"
                title={`Type v${i + 1} and Enter to set this variant`}
              >
                v{i + 1}
              </span>
              <span className="font-semibold">{tags[v.id]}</span>
              <span>{v.name}</span>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
