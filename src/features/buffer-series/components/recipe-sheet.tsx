// The printable recipe sheet: one page per series (A4 landscape), only on paper. It carries the
// cautions of PRODUCT.md: eye protection and gloves, acid to water, site rules and the suppliers'
// safety data sheets, and that results are research data.
import type { Recipe } from '@shared/chemistry';
import { mass, volume } from '@shared/chemistry/format';
import { phKey, type DesignedSeries, type SeriesRequest } from '@shared/schemas/buffer-series';
import { formatFixed, formatPlain, formatSig } from '@/components/ui/numbers';
import { DRIFT_LIMIT } from './point-row';

export const SHEET_CAUTIONS = [
  'Wear eye protection and gloves.',
  'Add acid to water, never water to acid.',
  'Follow your site’s chemical-safety rules and the suppliers’ safety data sheets.',
  'Results are research data, not a release test of any product.',
];

export type RecipeSheetProps = {
  name: string;
  design: DesignedSeries;
  request: SeriesRequest;
  version?: number;
};

function weighOut(r: Recipe): string {
  return r.components
    .filter((c) => c.role !== 'titrant' && c.role !== 'salt')
    .map((c) => {
      const amount =
        c.stockConc !== null && c.volume !== null
          ? `${volume(c.volume)} of ${formatSig(c.stockConc, 3)} M`
          : c.volume !== null && c.grams !== null
            ? `${volume(c.volume)} (${mass(c.grams)})`
            : c.grams !== null
              ? mass(c.grams)
              : '—';
      return `${c.name} ${amount}`;
    })
    .join('; ');
}

function titrant(r: Recipe): string {
  const t = r.components.find((c) => c.role === 'titrant');
  return t && t.volume !== null ? `${volume(t.volume)} ${formatSig(t.stockConc, 3)} M ${t.name}` : '—';
}

function salt(r: Recipe): string {
  const s = r.components.find((c) => c.role === 'salt');
  return s && s.grams !== null ? `${mass(s.grams)} ${s.formula ?? s.name}` : '—';
}

const cell = 'border border-neutral-400 px-1 py-0.5 align-top';

export function RecipeSheet({ name, design, request, version }: RecipeSheetProps) {
  const rows = design.points.flatMap((p) => [
    { p, recipe: p.recipe, role: 'main' as const, capacity: p.capacity },
    ...(p.overlap
      ? [{ p, recipe: p.overlap.recipe, role: 'overlap' as const, capacity: p.overlap.capacity }]
      : []),
  ]);
  const cautions = [
    ...design.cautions.filter((c) => !c.startsWith('Wear eye protection')),
    ...design.warnings,
  ];
  return (
    <article
      aria-label="Recipe sheet"
      className="recipe-sheet hidden text-[9pt] leading-tight text-black print:block"
    >
      <style>{'@page { size: A4 landscape; margin: 10mm; } .recipe-sheet { break-after: page; }'}</style>
      <div className="mb-1.5 flex items-baseline justify-between border-b border-black pb-1">
        <h1 className="text-[13pt] font-semibold">Recipe sheet: {name}</h1>
        <p>
          Bellwether buffer series{version ? `, version ${version}` : ''} · printed{' '}
          {new Date().toISOString().slice(0, 10)}
        </p>
      </div>
      <p className="mb-1.5">
        Assay at <strong>{design.assayTemperatureC} °C</strong>; buffers made up at{' '}
        <strong>{design.makeTemperatureC} °C</strong>; {formatPlain(request.bufferConcMm)} mM buffer;{' '}
        {formatPlain(request.volumeMl)} mL each;{' '}
        {request.method === 'titrate' ? 'titrated' : 'mixed from two forms'};{' '}
        {request.targetIonicStrengthM !== null
          ? `topped up to I = ${request.targetIonicStrengthM} M with ${request.salt}`
          : 'no ionic-strength target'}
        . pK″ with Davies activity corrections and Goldberg temperature dependence.
      </p>
      <table className="w-full border-collapse">
        <thead>
          <tr className="bg-neutral-100 text-left">
            <th className={cell}>pH (assay)</th>
            <th className={cell}>Buffer</th>
            <th className={cell}>Weigh or measure</th>
            <th className={cell}>Titrant (expected)</th>
            <th className={cell}>Salt</th>
            <th className={`${cell} text-right`}>Set pH at {design.makeTemperatureC} °C</th>
            <th className={`${cell} text-right`}>I (M)</th>
            <th className={`${cell} text-right`}>β (mM/pH)</th>
            <th className={`${cell} text-right`}>Well pH</th>
            <th className={cell}>Notes</th>
          </tr>
        </thead>
        <tbody>
          {rows.map(({ p, recipe, role, capacity }) => {
            const notes = [
              ...(role === 'overlap' ? ['overlap point'] : []),
              ...(role === 'overlap' && p.overlap?.systemId === p.proposal?.systemId
                ? ['same buffer as the one chosen']
                : []),
              ...(role === 'main' && design.overridden.includes(phKey(p.pH)) ? ['chosen by hand'] : []),
              ...(role === 'main' && p.weak && p.proposal ? ['weak capacity'] : []),
              ...(role === 'main' && p.well && Math.abs(p.well.drift) > DRIFT_LIMIT
                ? ['well drifts > 0.05 pH']
                : []),
            ];
            return (
              <tr key={`${phKey(p.pH)}-${role}`}>
                <td className={`${cell} text-right font-semibold tabular-nums`}>{phKey(p.pH)}</td>
                <td className={cell}>{recipe?.systemName ?? 'no buffer within one unit'}</td>
                <td className={cell}>{recipe ? weighOut(recipe) : '—'}</td>
                <td className={cell}>{recipe ? titrant(recipe) : '—'}</td>
                <td className={cell}>{recipe ? salt(recipe) : '—'}</td>
                <td className={`${cell} text-right tabular-nums`}>
                  {role === 'main' ? formatFixed(p.makeUp?.setPH, 2) : '—'}
                </td>
                <td className={`${cell} text-right tabular-nums`}>{formatSig(recipe?.ionicStrength, 3)}</td>
                <td className={`${cell} text-right tabular-nums`}>
                  {formatSig(capacity === null ? null : capacity * 1000, 3)}
                </td>
                <td className={`${cell} text-right tabular-nums`}>
                  {role === 'main' ? formatFixed(p.well?.pH, 2) : '—'}
                </td>
                <td className={cell}>{notes.join('; ')}</td>
              </tr>
            );
          })}
        </tbody>
      </table>
      <section aria-label="Cautions" className="mt-2 border border-black p-1.5">
        <h2 className="font-semibold">Cautions</h2>
        <ul className="list-disc pl-4">
          {SHEET_CAUTIONS.map((c) => (
            <li key={c} className="font-semibold">
              {c}
            </li>
          ))}
          {cautions.map((c) => (
            <li key={c}>{c}</li>
          ))}
        </ul>
      </section>
    </article>
  );
}
