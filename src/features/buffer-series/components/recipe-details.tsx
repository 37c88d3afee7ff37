// One recipe in full: what to weigh or measure (g, mL), titrant volume, salt to add, the final
// ionic strength, the written steps, and its own warnings and cautions.
import type { Recipe, RecipeComponent } from '@shared/chemistry';
import { mass, volume } from '@shared/chemistry/format';
import { formatFixed, formatSig } from '@/components/ui/numbers';

const roleLabels: Record<RecipeComponent['role'], string> = {
  'acid-form': 'Acid form',
  'base-form': 'Base form',
  'start-form': 'Weigh out',
  titrant: 'Titrant',
  salt: 'Salt',
};

function amountOf(c: RecipeComponent): string {
  if (c.role === 'titrant' && c.volume !== null)
    return `${volume(c.volume)} of ${formatSig(c.stockConc, 3)} M`;
  if (c.stockConc !== null && c.volume !== null)
    return `${volume(c.volume)} of ${formatSig(c.stockConc, 3)} M stock`;
  if (c.volume !== null && c.grams !== null) return `${volume(c.volume)} (${mass(c.grams)})`;
  if (c.grams !== null) return mass(c.grams);
  return '—';
}

export type RecipeDetailsProps = { recipe: Recipe; title: string };

export function RecipeDetails({ recipe: r, title }: RecipeDetailsProps) {
  const th = 'border-b border-line px-2 py-0.5 font-semibold';
  const salt = r.components.find((c) => c.role === 'salt');
  return (
    <section aria-label={title} className="rounded border border-line bg-surface p-2">
      <h4 className="font-semibold">{title}</h4>
      <p className="mb-1 text-sm text-ink-muted">
        {r.method === 'titrate' ? 'Titration' : 'Mixing'} · {r.ionization.label} · pK″{' '}
        {formatFixed(r.ionization.pKapp, 2)} at {r.temperatureC} °C · {formatSig(r.totalConc * 1000, 3)} mM ·{' '}
        {volume(r.volume)} · final I = {formatSig(r.ionicStrength, 3)} M
        {salt ? ` (${formatSig(r.saltConc * 1000, 3)} mM ${salt.name} added)` : ' (no salt added)'}
      </p>
      <table className="w-full border-collapse text-sm" aria-label={`Components: ${title}`}>
        <thead className="bg-canvas text-left text-ink-muted">
          <tr>
            <th scope="col" className={th}>
              Role
            </th>
            <th scope="col" className={th}>
              Component
            </th>
            <th scope="col" className={`${th} text-right`}>
              FW (g/mol)
            </th>
            <th scope="col" className={`${th} text-right`}>
              Amount
            </th>
            <th scope="col" className={`${th} text-right`}>
              mmol
            </th>
          </tr>
        </thead>
        <tbody>
          {r.components.map((c) => (
            <tr key={`${c.role}-${c.id}`} className="border-b border-line last:border-b-0">
              <td className="px-2 py-0.5 text-ink-muted">{roleLabels[c.role]}</td>
              <td className="px-2 py-0.5">
                {c.name}{' '}
                {c.formula && c.formula !== c.name && (
                  <span className="font-mono text-ink-muted">{c.formula}</span>
                )}
              </td>
              <td className="num px-2 py-0.5">{formatFixed(c.formulaWeight, 3)}</td>
              <td className="num px-2 py-0.5">{amountOf(c)}</td>
              <td className="num px-2 py-0.5">{formatSig(c.moles * 1000, 4)}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <ol className="mt-1.5 list-decimal space-y-0.5 pl-5 text-sm">
        {r.steps.map((s) => (
          <li key={s}>{s}</li>
        ))}
      </ol>
      {r.warnings.length > 0 && (
        <ul className="mt-1 list-disc pl-5 text-sm text-warn-800">
          {r.warnings.map((w) => (
            <li key={w}>{w}</li>
          ))}
        </ul>
      )}
    </section>
  );
}
