// The fitted parameters of a study, one row per variant: model, points, optimum, the apparent pKa of
// each limb, the half-activity window and the peak activity, each over its interval; flags below.
import type { VariantProfile } from '@shared/analysis';
import type { ProfileFit } from '@shared/fitting';
import { intervalMarks, pickInterval, type IntervalKind } from '@/lib/intervals';
import { EstimateCell } from './estimate-cell';

/** The pKa that sets each limb, whatever the model (as shared/comparison reads them). */
function limbs(fit: ProfileFit) {
  const p = fit.parameters;
  switch (fit.model) {
    case 'acid':
      return { acid: p.pKa, alkaline: undefined };
    case 'base':
      return { acid: undefined, alkaline: p.pKa };
    case 'three':
      return { acid: p.pKb, alkaline: p.pKc };
    default:
      return { acid: p.pKa1, alkaline: p.pKa2 };
  }
}

const modelWords: Record<string, string> = {
  acid: 'acid limb',
  base: 'alkaline limb',
  bell: 'bell',
  'bell-plateau': 'bell, plateaus',
  three: 'three ionizations',
};

export type ParameterTableProps = {
  profiles: VariantProfile[];
  activityUnit: string;
  bootstrapCurrent: boolean;
};

const th = 'border-b border-line py-1 pr-2 font-semibold';

export function ParameterTable({ profiles, activityUnit, bootstrapCurrent }: ParameterTableProps) {
  const kinds = new Set<IntervalKind>();
  for (const p of profiles) {
    const c = pickInterval(p.fit?.pHopt, bootstrapCurrent);
    if (c) kinds.add(c.kind);
  }
  const flagged = profiles.filter((p) => (p.fit?.flags.length ?? 0) > 0 || p.error);
  const cell = { bootstrapCurrent };
  return (
    <div>
      <table className="w-full border-collapse text-sm" aria-label="Fitted parameters">
        <thead className="text-left text-ink-muted">
          <tr>
            <th className={th}>Variant</th>
            <th className={th}>Model</th>
            <th className={`${th} text-right`}>n</th>
            <th className={`${th} text-right`}>pH optimum</th>
            <th className={`${th} text-right`}>apparent pKa, acid limb</th>
            <th className={`${th} text-right`}>apparent pKa, alkaline limb</th>
            <th className={`${th} text-right`}>half-activity low pH</th>
            <th className={`${th} text-right`}>half-activity high pH</th>
            <th className={`${th} text-right`}>width</th>
            <th className={`${th} text-right`}>peak ({activityUnit})</th>
          </tr>
        </thead>
        <tbody>
          {profiles.map((p) => {
            const fit = p.fit;
            const l = fit ? limbs(fit) : null;
            return (
              <tr key={p.variantId} className="border-b border-line align-top last:border-b-0">
                <td className="py-1 pr-2 font-semibold">
                  {p.name}
                  {p.isReference && (
                    <span className="block text-xs font-normal text-ink-muted">reference</span>
                  )}
                </td>
                <td className="py-1 pr-2">{fit ? (modelWords[fit.model] ?? fit.model) : 'no fit'}</td>
                <td className="num py-1 pr-2">{fit?.n ?? '—'}</td>
                <td className="num py-1 pr-2">
                  <EstimateCell estimate={fit?.pHopt} phLike {...cell} />
                </td>
                <td className="num py-1 pr-2">
                  <EstimateCell estimate={l?.acid} phLike {...cell} />
                </td>
                <td className="num py-1 pr-2">
                  <EstimateCell estimate={l?.alkaline} phLike {...cell} />
                </td>
                <td className="num py-1 pr-2">
                  <EstimateCell estimate={fit?.window.lo} phLike {...cell} />
                </td>
                <td className="num py-1 pr-2">
                  <EstimateCell estimate={fit?.window.hi} phLike {...cell} />
                </td>
                <td className="num py-1 pr-2">
                  <EstimateCell estimate={fit?.window.width} phLike {...cell} />
                </td>
                <td className="num py-1">
                  <EstimateCell estimate={fit?.peak} phLike={false} {...cell} />
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
      <p className="mt-1 text-xs text-ink-muted">
        Under each value: its {[...kinds].map((k) => intervalMarks[k].words).join('; ') || '95 % interval'}. “Open”:
        the data do not bound the interval on that side.
      </p>
      {flagged.length > 0 && (
        <ul className="mt-2 space-y-0.5 text-sm">
          {flagged.map((p) => (
            <li key={p.variantId}>
              <span className="font-semibold">{p.name}:</span>{' '}
              {p.error ? p.error.message : p.fit?.flags.map((f) => f.message).join(' ')}
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
