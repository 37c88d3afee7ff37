// Every estimate of one fit with all the intervals the engine gave (t, profile likelihood, bootstrap)
// and the goodness of fit, so a reader can see what the summary table chose and why.
import type { DerivedEstimate, ParameterEstimate, ProfileFit } from '@shared/fitting';
import { formatFixed, formatSig } from '@/components/ui/numbers';
import { formatInterval, sigFor } from '../utils/format-estimate';
import { pkaNames } from '../utils/models';

export type FitDetailsProps = { fit: ProfileFit; activityUnit: string };

type Row = { name: string; e: ParameterEstimate | DerivedEstimate; ph: boolean };

const th = 'border-b border-line px-2 py-1 font-semibold';
const td = 'px-2 py-0.5 num';

export function FitDetails({ fit, activityUnit }: FitDetailsProps) {
  const pkas = new Set(pkaNames[fit.model]);
  const rows: Row[] = [
    ...fit.parameterNames.map((n) => ({
      name: pkas.has(n) ? `apparent ${n}` : `${n} (${activityUnit})`,
      e: fit.parameters[n],
      ph: pkas.has(n),
    })),
    ...(fit.delta ? [{ name: 'Δ = pKa2 − pKa1', e: fit.delta, ph: true }] : []),
    { name: 'optimum pH', e: fit.pHopt, ph: true },
    { name: `peak (${activityUnit})`, e: fit.peak, ph: false },
    { name: 'half-activity low', e: fit.window.lo, ph: true },
    { name: 'half-activity high', e: fit.window.hi, ph: true },
    { name: 'half-activity width', e: fit.window.width, ph: true },
  ];
  return (
    <section aria-labelledby="fit-details-title" className="rounded border border-line bg-surface p-3">
      <h4 id="fit-details-title" className="font-semibold">
        Estimates and intervals
      </h4>
      <table aria-label="Estimates with every interval" className="mt-1 w-full border-collapse text-sm">
        <thead className="bg-canvas text-left text-ink-muted">
          <tr>
            <th className={th}>Quantity</th>
            <th className={`${th} text-right`}>Value</th>
            <th className={`${th} text-right`}>SE</th>
            <th className={`${th} text-right`}>95 % t</th>
            <th className={`${th} text-right`}>Profile 95 %</th>
            <th className={`${th} text-right`}>Bootstrap 95 %</th>
          </tr>
        </thead>
        <tbody>
          {rows.map(({ name, e, ph }) => {
            const sig = sigFor(e.value, e.ci95);
            const style = ph ? { decimals: 2 } : { sig };
            const notDetermined = 'status' in e && e.status === 'not_determined';
            return (
              <tr key={name}>
                <td className="px-2 py-0.5">{name}</td>
                <td className={td}>
                  {notDetermined ? (
                    <span className="text-warn-800">not determined</span>
                  ) : ph ? (
                    formatFixed(e.value, 3)
                  ) : (
                    formatSig(e.value, sig)
                  )}
                </td>
                <td className={td}>{formatSig(e.se, 2)}</td>
                <td className={td}>{formatInterval(e.ci95, style) || '—'}</td>
                <td className={td}>{formatInterval(e.profile95, style) || '—'}</td>
                <td className={td}>{formatInterval(e.boot95, style) || '—'}</td>
              </tr>
            );
          })}
        </tbody>
      </table>
      <p className="mt-2 text-sm text-ink-muted">
        n = {fit.n} wells, {fit.nFitted} parameters, {fit.dof} degrees of freedom; SSR {formatSig(fit.ssr, 4)}
        , s {formatSig(fit.s2 !== null ? Math.sqrt(fit.s2) : null, 3)} {activityUnit}; AICc{' '}
        {formatFixed(fit.aicc, 1)}; {fit.converged ? 'converged' : `did not converge (${fit.stop})`} after{' '}
        {fit.iterations} iterations from {fit.starts} starts.
        {fit.runs &&
          ` Runs test on the residual signs: ${fit.runs.runs} runs (${formatFixed(fit.runs.expected, 1)} expected), p = ${formatSig(fit.runs.pValue, 2)}.`}
        {fit.bootstrap &&
          ` Bootstrap: ${fit.bootstrap.resamples} resamples, ${fit.bootstrap.undetermined} left the optimum undetermined.`}
      </p>
    </section>
  );
}
