// How the model was chosen: the AICc table of every candidate (with Akaike weights), the nested
// F-tests climbed from the simplest model, and the reason in words.
import type { ModelSelection } from '@shared/analysis';
import { formatFixed, formatSig } from '@/components/ui/numbers';
import { modelWords } from '../utils/models';

export type ModelChoiceProps = { selection: ModelSelection };

const th = 'border-b border-line px-2 py-1 font-semibold';
const td = 'px-2 py-0.5';

const pText = (p: number | null) =>
  p === null ? '—' : p < 1e-4 ? p.toExponential(1).replace('-', '−') : formatSig(p, 2);

export function ModelChoice({ selection }: ModelChoiceProps) {
  return (
    <section aria-labelledby="model-choice-title" className="rounded border border-line bg-surface p-3">
      <h4 id="model-choice-title" className="font-semibold">
        Model: {modelWords[selection.model]}{' '}
        <span className="font-normal text-ink-muted">
          (
          {selection.requested === 'auto'
            ? 'the simplest adequate model, chosen by the data'
            : 'chosen in the settings'}
          )
        </span>
      </h4>
      <p className="mt-0.5 text-sm">{selection.reason}</p>
      {selection.candidates.length > 0 && (
        <table aria-label="Model comparison by AICc" className="mt-2 w-full border-collapse text-sm">
          <thead className="bg-canvas text-left text-ink-muted">
            <tr>
              <th className={th}>Candidate</th>
              <th className={`${th} text-right`}>Parameters</th>
              <th className={`${th} text-right`}>SSR</th>
              <th className={`${th} text-right`}>AICc</th>
              <th className={`${th} text-right`}>ΔAICc</th>
              <th className={`${th} text-right`}>Weight</th>
            </tr>
          </thead>
          <tbody>
            {selection.candidates.map((c) => (
              <tr key={c.model} className={c.model === selection.model ? 'bg-accent-50 font-semibold' : ''}>
                <td className={td}>
                  {modelWords[c.model]}
                  {!c.usable && (
                    <span className="ml-1 text-xs font-normal text-warn-800">
                      (a pKa ran out of the data)
                    </span>
                  )}
                  {!c.converged && (
                    <span className="ml-1 text-xs font-normal text-warn-800">(did not converge)</span>
                  )}
                </td>
                <td className={`${td} num`}>{c.nFitted}</td>
                <td className={`${td} num`}>{formatSig(c.ssr, 4)}</td>
                <td className={`${td} num`}>{formatFixed(c.aicc, 1)}</td>
                <td className={`${td} num`}>{formatFixed(c.deltaAicc, 1)}</td>
                <td className={`${td} num`}>{formatFixed(c.weight, 2)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
      {selection.tests.length > 0 && (
        <table aria-label="Nested F-tests" className="mt-3 w-full border-collapse text-sm">
          <thead className="bg-canvas text-left text-ink-muted">
            <tr>
              <th className={th}>Simpler → more complex</th>
              <th className={`${th} text-right`}>F</th>
              <th className={`${th} text-right`}>df</th>
              <th className={`${th} text-right`}>p</th>
            </tr>
          </thead>
          <tbody>
            {selection.tests.map((t) => (
              <tr key={`${t.simpler}-${t.complex}`}>
                <td className={td}>
                  {t.simpler} → {t.complex}
                </td>
                <td className={`${td} num`}>{formatSig(t.F, 3)}</td>
                <td className={`${td} num`}>
                  {t.df1}, {t.df2}
                </td>
                <td className={`${td} num`}>{pText(t.pValue)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
      <p className="mt-1 text-xs text-ink-muted">
        A more complex model is kept only when its F-test against the simpler one is significant; AICc weights
        say how the candidates compare.
      </p>
    </section>
  );
}
