// Warnings attached to a fit. Codes are stable strings (the command line and the screens key on
// them); messages say what is wrong in a scientist's words.

import { DETERMINED_MARGIN } from './fit-core';
import type { StopReason } from './lm';
import type { PhModel } from './models';
import type { RunsTest } from './stats/runs-test';
import type { Flag } from './types';

/** Δ below which V, pKa1 and pKa2 of a bell are strongly correlated (SCIENCE.md §1.7). */
export const NARROW_DELTA = 2;
/** Fewer points than this per fitted parameter: common practice, no source. */
export const POINTS_PER_PARAMETER = 3;
/** How far data should reach beyond a pKa for the plateau past it to be seen (SCIENCE.md §1.3). */
export const PLATEAU_REACH = 1.5;
export const RUNS_ALPHA = 0.05;

export interface FlagInput {
  model: PhModel;
  /** unscaled parameter values */
  theta: ArrayLike<number>;
  status: readonly ('free' | 'fixed' | 'undetermined')[];
  lo: number;
  hi: number;
  n: number;
  nFitted: number;
  distinctPH: number;
  converged: boolean;
  stop: StopReason;
  /** successive pKa differences with their standard errors and the t quantile */
  gaps: { names: [string, string]; delta: number; se: number | null }[];
  t: number | null;
  runs: RunsTest | null;
}

const fmt = (x: number): string => (Math.abs(x) >= 100 ? x.toFixed(0) : x.toPrecision(3));

export function buildFlags(f: FlagInput): Flag[] {
  const flags: Flag[] = [];
  const { model, theta, status, lo, hi } = f;
  const names = model.names;
  const m = model.nLinear;
  if (!f.converged) {
    flags.push({
      code: 'not_converged',
      message: `The fit did not converge (the solver stopped: ${f.stop}).`,
    });
  }
  for (let j = 0; j < names.length; j++) {
    if (status[j] === 'free') continue;
    const name = names[j];
    if (j >= m) {
      const side = model.runaway[j]?.side;
      const message =
        status[j] === 'fixed'
          ? `${name} is not determined: the data show no sign of it, and the fit improves as it moves ` +
            `${side === -1 ? `below pH ${fmt(lo - DETERMINED_MARGIN)}` : `above pH ${fmt(hi + DETERMINED_MARGIN)}`}. ` +
            'It is reported as null, never as a runaway number; the simpler model is offered instead.'
          : `${name} is not determined: the data do not fix it (it moves more than ${DETERMINED_MARGIN} units ` +
            'beyond the measured pH range, or the fitted curve does not depend on it). It is reported as null.';
      flags.push({ code: `${name}_not_determined`, message });
    } else {
      flags.push({
        code: `${name}_not_determined`,
        message: `${name} is not determined: it depends on a pKa the data do not fix.`,
      });
    }
  }
  for (let j = m; j < names.length; j++) {
    if (status[j] !== 'free') continue;
    if (theta[j] < lo || theta[j] > hi) {
      flags.push({
        code: `${names[j]}_outside_range`,
        message: `Apparent ${names[j]} = ${fmt(theta[j])} lies outside the measured pH range ${fmt(lo)}–${fmt(hi)}: it is an extrapolation.`,
      });
    }
  }
  for (const gap of f.gaps) {
    const [a, b] = gap.names;
    const bound = gap.se !== null && f.t !== null ? gap.delta - f.t * gap.se : null;
    if (gap.delta <= 1e-9 || (bound !== null && bound <= 0)) {
      flags.push({
        code: 'pKa_too_close',
        message: `${a} and ${b} cannot be told apart (difference ${fmt(gap.delta)}${gap.se !== null ? ` ± ${fmt(gap.se)}` : ''}): their 95 % interval of the difference reaches zero.`,
      });
    }
  }
  if (model.id === 'bell' || model.id === 'bell-plateau') {
    const gap = f.gaps.find((g) => g.names[0] === 'pKa1');
    if (gap && gap.delta < NARROW_DELTA) {
      flags.push({
        code: 'narrow_bell',
        message: `Δ = pKa2 − pKa1 = ${fmt(gap.delta)} < ${NARROW_DELTA}: V and the pKa values are strongly correlated and V lies above every measured rate (an extrapolation). The optimum is well determined; report it first.`,
      });
    }
  }
  if (model.id === 'bell-plateau') {
    if (status[3] === 'free' && status[0] === 'free' && lo > theta[3] - PLATEAU_REACH) {
      flags.push({
        code: 'V_lo_extrapolated',
        message: `The data reach only ${fmt(theta[3] - lo)} units below pKa1 (about ${PLATEAU_REACH} are needed): the low-pH plateau V_lo is an extrapolation.`,
      });
    }
    if (status[4] === 'free' && status[2] === 'free' && hi < theta[4] + PLATEAU_REACH) {
      flags.push({
        code: 'V_hi_extrapolated',
        message: `The data reach only ${fmt(hi - theta[4])} units above pKa2 (about ${PLATEAU_REACH} are needed): the high-pH plateau V_hi is an extrapolation.`,
      });
    }
  }
  if (f.n < POINTS_PER_PARAMETER * f.nFitted || f.distinctPH <= f.nFitted) {
    flags.push({
      code: 'too_few_points',
      message: `${f.n} points at ${f.distinctPH} pH values for ${f.nFitted} parameters (fewer than ${POINTS_PER_PARAMETER} points per parameter, or not more pH values than parameters): the estimates are fragile and the intervals wide.`,
    });
  }
  if (f.runs && f.runs.pValue < RUNS_ALPHA) {
    flags.push({
      code: 'residual_runs',
      message: `The residuals, in order of pH, come in ${f.runs.runs} runs of one sign where about ${fmt(f.runs.expected)} are expected (Wald–Wolfowitz runs test, p = ${f.runs.pValue.toPrecision(2)}): the model misses a systematic feature of the data.`,
    });
  }
  return flags;
}
