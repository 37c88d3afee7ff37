// The global fit in words a scientist reads at a glance: is one shared value (e.g. one apparent pKa1
// for every variant) an adequate description, or does at least one profile need its own?
// The extra-sum-of-squares F-test compares the nested models (shared inside separate):
//   F = ((SSR_shared − SSR_separate) / df1) / (SSR_separate / df2),
// df1 = parameters saved by sharing, df2 = residual degrees of freedom of the separate fits.
// AICc = n·ln(SSR/n) + 2k + 2k(k+1)/(n − k − 1) weighs fit against parameters; lower is better, and
// a difference below about 2 hardly separates two models (Burnham & Anderson 2002 [memory]).
import type { GlobalFit } from '@shared/fitting';
import { formatFixed, formatSig } from '@/components/ui/numbers';
import { formatP } from './format';

export const sharedLabels: Record<string, string> = {
  pKa1: 'apparent pKa1',
  pKa2: 'apparent pKa2',
  pKa: 'apparent pKa',
};

const list = (items: string[]) =>
  items.length <= 1 ? (items[0] ?? '') : `${items.slice(0, -1).join(', ')} and ${items[items.length - 1]}`;

/** "p = 0.012", or "p < 10⁻¹⁰" when it is below what the computation resolves. */
export function pIs(p: number | null) {
  const text = formatP(p);
  return text.startsWith('<') ? `p ${text}` : `p = ${text}`;
}

export type GlobalFitWords = {
  verdict: string;
  supported: boolean;
  test: string;
  aicc: string;
  shared: string[];
};

export function globalFitWords(fit: GlobalFit, profiles: number): GlobalFitWords {
  const names = list(fit.shared.map((s) => sharedLabels[s] ?? s));
  const c = fit.comparison;
  const supported = c.preferred === 'shared';
  const verdict = supported
    ? `Sharing ${names} is supported: one value for all ${profiles} profiles fits about as well as a value for each.`
    : `Sharing ${names} is not supported: one value for all ${profiles} profiles fits clearly worse than a value for each, so at least one profile has its own.`;
  const test =
    c.F === null
      ? 'The F-test could not be computed (a fit did not give a sum of squares).'
      : `F-test of shared against separate: F = ${formatSig(c.F, 3)} on ${c.df1} and ${c.df2} degrees of freedom, ${pIs(c.pValue)} (${supported ? 'not below' : 'below'} 0.05).`;
  const shared = fit.aicc;
  const separate = c.separate.aicc;
  let aicc = 'AICc could not be computed for both descriptions.';
  if (shared !== null && separate !== null) {
    const gap = Math.abs(shared - separate);
    const lower = shared < separate ? 'shared' : 'separate';
    const agrees = (lower === 'shared') === supported;
    aicc =
      gap < 2
        ? `AICc hardly tells them apart: shared ${formatFixed(shared, 1)}, separate ${formatFixed(separate, 1)} (difference ${formatFixed(gap, 1)}, below 2).`
        : `AICc ${agrees ? 'agrees' : 'disagrees'}: it prefers the ${lower} values (shared ${formatFixed(shared, 1)}, separate ${formatFixed(separate, 1)}; lower is better, difference ${formatFixed(gap, 1)}).`;
  }
  return { verdict, supported, test, aicc, shared: fit.shared };
}
