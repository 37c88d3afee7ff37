// One pH point of the design: proposed system (or the scientist's override), pK″, distance,
// capacity (weak points in amber), overlap, set-pH at make-up temperature, and the well pH with its
// drift (more than 0.05 pH in amber). The recipe details open below the row.
import type { SeriesPoint } from '@shared/chemistry';
import { phKey } from '@shared/schemas/buffer-series';
import { Button } from '@/components/ui/button';
import { formatFixed, formatSig, formatSigned } from '@/components/ui/numbers';
import { PhChip } from './ph-chip';
import { RecipeDetails } from './recipe-details';

export const DRIFT_LIMIT = 0.05;

export type PointRowProps = {
  point: SeriesPoint;
  /** The designer's own proposal and alternatives at this pH (before any override). */
  choices: SeriesPoint | undefined;
  overridden: boolean;
  onOverride?: (key: string, systemId: string | null) => void;
  expanded: boolean;
  onToggle: () => void;
  columns: number;
};

const amber = 'bg-warn-50 text-warn-800';

export function PointRow(props: PointRowProps) {
  const { point: p, choices, overridden, onOverride, expanded, onToggle } = props;
  const key = phKey(p.pH);
  const drift = p.well?.drift ?? null;
  const drifts = drift !== null && Math.abs(drift) > DRIFT_LIMIT;
  const options = choices?.proposal
    ? [choices.proposal, ...choices.alternatives]
    : p.proposal
      ? [p.proposal]
      : [];
  const designerChoice = choices?.proposal?.systemId;
  return (
    <>
      <tr className={`border-b border-line ${expanded ? 'bg-accent-50/40' : ''}`}>
        <td className="px-2 py-1">
          <PhChip pH={p.pH} />
        </td>
        <td className="px-2 py-1">
          {!p.proposal ? (
            <span className="font-semibold text-danger-600">No buffer within one pH unit</span>
          ) : onOverride && options.length > 1 ? (
            <select
              aria-label={`Buffer system at pH ${key}`}
              value={p.proposal.systemId}
              onChange={(ev) => onOverride(key, ev.target.value === designerChoice ? null : ev.target.value)}
              className="h-7 w-52 rounded border border-line-strong bg-surface px-1"
            >
              {options.map((c) => (
                <option key={c.systemId} value={c.systemId}>
                  {c.systemId === designerChoice
                    ? c.systemName
                    : `${c.systemName} · pK″ ${c.pKapp.toFixed(2)}`}
                </option>
              ))}
            </select>
          ) : (
            <span>{p.proposal.systemName}</span>
          )}
          {overridden ? (
            <span className="ml-1.5 text-sm font-semibold text-accent-700">your choice</span>
          ) : (
            p.proposal &&
            onOverride &&
            options.length > 1 && <span className="ml-1.5 text-sm text-ink-muted">proposed</span>
          )}
        </td>
        <td className="num px-2 py-1">{formatFixed(p.proposal?.pKapp, 2)}</td>
        <td className="num px-2 py-1">{formatFixed(p.proposal?.distance, 2)}</td>
        <td className={`num px-2 py-1 ${p.weak && p.proposal ? amber : ''}`}>
          {formatSig(p.capacity === null ? null : p.capacity * 1000, 3)}
          {p.weak && p.proposal && <span className="ml-1 text-sm font-semibold">weak</span>}
        </td>
        <td className="px-2 py-1">
          {p.overlap ? (
            <span>
              {p.overlap.systemName}{' '}
              <span className="text-sm text-ink-muted tabular-nums">
                β {formatSig(p.overlap.capacity * 1000, 3)}
              </span>
              {p.overlap.systemId === p.proposal?.systemId && (
                <span className="block text-sm text-warn-800">same buffer as the one chosen</span>
              )}
            </span>
          ) : (
            <span className="text-ink-faint">—</span>
          )}
        </td>
        <td className="num px-2 py-1">{formatFixed(p.makeUp?.setPH, 2)}</td>
        <td className={`num px-2 py-1 ${drifts ? amber : ''}`}>
          {p.well ? (
            <>
              {formatFixed(p.well.pH, 2)}{' '}
              <span className={`text-sm ${drifts ? 'font-semibold' : 'text-ink-muted'}`}>
                ({formatSigned(drift, 2)})
              </span>
            </>
          ) : (
            '—'
          )}
        </td>
        <td className="px-2 py-1 text-right">
          {p.recipe && (
            <Button size="sm" variant="ghost" aria-expanded={expanded} onClick={onToggle}>
              {expanded ? 'Hide' : 'Recipe'}
              <span className="sr-only"> at pH {key}</span>
            </Button>
          )}
        </td>
      </tr>
      {expanded && p.recipe && (
        <tr className="border-b border-line bg-canvas">
          <td colSpan={props.columns} className="px-3 py-2">
            <div className={`grid gap-3 ${p.overlap ? 'grid-cols-2' : 'grid-cols-1'}`}>
              <RecipeDetails recipe={p.recipe} title={`pH ${key}: ${p.recipe.systemName}`} />
              {p.overlap && (
                <RecipeDetails
                  recipe={p.overlap.recipe}
                  title={`pH ${key}, overlap: ${p.overlap.systemName}`}
                />
              )}
            </div>
            {p.makeUp && (
              <p className="mt-1.5 text-sm">
                Made up at {p.makeUp.temperatureC} °C: set the pH meter to{' '}
                <strong className="tabular-nums">{formatFixed(p.makeUp.setPH, 2)}</strong>
                {p.makeUp.naiveAssayPH !== null &&
                  Math.abs(p.makeUp.naiveAssayPH - p.pH) >= 0.005 &&
                  ` (set to ${key} there, it would read ${formatFixed(p.makeUp.naiveAssayPH, 2)} at the assay temperature)`}
                .
              </p>
            )}
            {p.warnings.length > 0 && (
              <ul className="mt-1 list-disc pl-5 text-sm text-warn-800">
                {p.warnings.map((w) => (
                  <li key={w}>{w}</li>
                ))}
              </ul>
            )}
          </td>
        </tr>
      )}
    </>
  );
}
