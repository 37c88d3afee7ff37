// The answer of the global fit in words (is sharing supported?), with the F-test and AICc behind it,
// the shared value and each profile's own parameters.
import type { ComparisonView } from '@shared/schemas/comparisons';
import { Notice } from '@/components/ui/notice';
import { formatFixed, formatSig } from '@/components/ui/numbers';
import { globalFitWords, sharedLabels } from '../utils/global-fit-words';

export type GlobalFitResultProps = { globalFit: NonNullable<ComparisonView['globalFit']> };

const interval = (ci: [number, number] | null, digits = 2) =>
  ci ? `${formatFixed(ci[0], digits)} to ${formatFixed(ci[1], digits)}` : '';

export function GlobalFitResult({ globalFit }: GlobalFitResultProps) {
  if ('error' in globalFit) {
    return (
      <Notice tone="warning" title="The global fit could not be made">
        {globalFit.error}
      </Notice>
    );
  }
  const words = globalFitWords(globalFit, globalFit.datasets.length);
  const parameterNames = Object.keys(globalFit.datasets[0]?.parameters ?? {});
  return (
    <section aria-label="Global fit" className="rounded border border-line bg-surface p-4">
      <h3 className="text-base">Global fit: is a shared value supported?</h3>
      <p className={`mt-1 font-semibold ${words.supported ? 'text-accent-800' : 'text-warn-800'}`}>
        {words.verdict}
      </p>
      <p className="mt-1 text-ink-muted">{words.test}</p>
      <p className="text-ink-muted">{words.aicc}</p>
      {!globalFit.converged && (
        <p className="mt-1 text-warn-800">
          The global fit did not converge ({globalFit.stop}); read these figures with care.
        </p>
      )}
      <ul className="mt-2">
        {Object.entries(globalFit.sharedParameters).map(([name, e]) => (
          <li key={name}>
            Shared {sharedLabels[name] ?? name}:{' '}
            <span className="font-semibold tabular-nums">{formatFixed(e.value, 2)}</span>{' '}
            <span className="text-ink-muted tabular-nums">({interval(e.ci95)})</span>
          </li>
        ))}
      </ul>
      <table className="mt-3 w-full border-collapse text-sm" aria-label="Parameters of the global fit">
        <thead className="text-left text-ink-muted">
          <tr>
            <th className="border-b border-line py-1 pr-3 font-semibold">Profile</th>
            {parameterNames.map((n) => (
              <th key={n} className="border-b border-line py-1 pr-3 text-right font-semibold">
                {n}
              </th>
            ))}
            <th className="border-b border-line py-1 text-right font-semibold">pH optimum</th>
          </tr>
        </thead>
        <tbody>
          {globalFit.datasets.map((d) => (
            <tr key={d.id} className="border-b border-line last:border-b-0">
              <td className="py-1 pr-3">{globalFit.labels[d.id] ?? d.id}</td>
              {parameterNames.map((n) => {
                const p = d.parameters[n];
                const digits = n === 'V' ? undefined : 2;
                return (
                  <td key={n} className="num py-1 pr-3">
                    {digits === undefined ? formatSig(p?.value, 3) : formatFixed(p?.value, digits)}
                    {p?.shared && <span className="ml-1 text-xs text-accent-800">shared</span>}
                  </td>
                );
              })}
              <td className="num py-1">{formatFixed(d.pHopt.value, 2)}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <p className="mt-2 text-sm text-ink-muted">
        V: the pH-independent limiting activity, in the profiles’ activity units. The pKa values are apparent:
        macroscopic constants of the active form, not assigned to particular groups.
      </p>
    </section>
  );
}
