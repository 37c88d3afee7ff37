// The forms of a buffer system a recipe can weigh out: formula and formula weight (computed from
// the formula with IUPAC standard atomic weights), counter-ions, state.
import { FORMULA_WEIGHT_SOURCE, type BufferForm } from '@shared/chemistry';
import { formatFixed, formatPlain } from '@/components/ui/numbers';

export type FormsTableProps = { forms: BufferForm[]; systemName: string };

const th = 'border-b border-line px-3 py-1 font-semibold';

function counterIons(f: BufferForm): string {
  const parts = (['Na', 'K', 'Cl'] as const)
    .filter((k) => f.counterIons[k] > 0)
    .map((k) => `${f.counterIons[k]} ${k}`);
  return parts.length ? parts.join(', ') : '—';
}

export function FormsTable({ forms, systemName }: FormsTableProps) {
  return (
    <div>
      <table
        aria-label={`Forms of ${systemName}`}
        className="w-full border-collapse rounded border border-line bg-surface"
      >
        <thead className="bg-canvas text-left text-sm text-ink-muted">
          <tr>
            <th scope="col" className={th}>
              Form
            </th>
            <th scope="col" className={th}>
              Formula
            </th>
            <th scope="col" className={`${th} text-right`}>
              Formula weight (g/mol)
            </th>
            <th scope="col" className={`${th} text-right`}>
              Units per formula
            </th>
            <th scope="col" className={th}>
              Counter-ions
            </th>
            <th scope="col" className={th}>
              State
            </th>
            <th scope="col" className={`${th} text-right`}>
              Density (g/mL)
            </th>
          </tr>
        </thead>
        <tbody>
          {forms.map((f) => (
            <tr key={f.id} className="border-b border-line last:border-b-0">
              <td className="px-3 py-1">
                {f.name}
                {f.note && <span className="block text-sm text-ink-muted">{f.note}</span>}
              </td>
              <td className="px-3 py-1 font-mono text-sm">{f.formula}</td>
              <td className="num px-3 py-1">{formatFixed(f.formulaWeight, 3)}</td>
              <td className="num px-3 py-1">{formatPlain(f.unitsPerFormula)}</td>
              <td className="px-3 py-1">{counterIons(f)}</td>
              <td className="px-3 py-1">{f.state}</td>
              <td className="num px-3 py-1">{formatPlain(f.density)}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <p className="mt-1 text-sm text-ink-muted">Formula weights: {FORMULA_WEIGHT_SOURCE}.</p>
    </div>
  );
}
