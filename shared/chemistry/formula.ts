// Molar masses computed from a chemical formula and standard atomic weights, so that every formula
// weight in the buffer library can be checked from its formula.
// Atomic weights: IUPAC/CIAAW standard atomic weights (2021), conventional values for the elements
// given as intervals (H, B, C, N, O, S, Cl) [memory]. Older tables differ in the third decimal
// (Tris 121.135 with 1990s weights, 121.136 here).
import { ChemFailure, guard, type ChemResult } from './result';

export const ATOMIC_WEIGHTS: Readonly<Record<string, number>> = {
  H: 1.008,
  B: 10.81,
  C: 12.011,
  N: 14.007,
  O: 15.999,
  Na: 22.98976928,
  Mg: 24.305,
  P: 30.973761998,
  S: 32.06,
  Cl: 35.45,
  K: 39.0983,
  Ca: 40.078,
  As: 74.921595,
};

/**
 * Element counts of a formula such as "Na2HPO4·7H2O", "C6H6Na2O7·1.5H2O", "C4H11NO3·HCl" or
 * "(CH3)2AsO2Na". Parts joined by "·" (or "*") may carry a leading multiplier.
 */
export function parseFormula(formula: string): Record<string, number> {
  const counts: Record<string, number> = {};
  for (const rawPart of formula.split(/[·*]/)) {
    const part = rawPart.trim();
    const lead = /^(\d+(?:\.\d+)?)?(.*)$/.exec(part);
    const multiplier = lead && lead[1] ? Number(lead[1]) : 1;
    const body = lead ? lead[2] : part;
    if (!body) throw new ChemFailure('invalid-input', `Formula "${formula}" has an empty part.`);
    const parsed = parseGroup(body, formula);
    for (const [el, n] of Object.entries(parsed)) counts[el] = (counts[el] ?? 0) + n * multiplier;
  }
  return counts;
}

function parseGroup(text: string, whole: string): Record<string, number> {
  const stack: Record<string, number>[] = [{}];
  const token = /([A-Z][a-z]?|\(|\))(\d+(?:\.\d+)?)?/y;
  let index = 0;
  while (index < text.length) {
    token.lastIndex = index;
    const m = token.exec(text);
    if (!m)
      throw new ChemFailure('invalid-input', `Cannot read formula "${whole}" at "${text.slice(index)}".`);
    index = token.lastIndex;
    const n = m[2] ? Number(m[2]) : 1;
    if (m[1] === '(') {
      if (m[2]) throw new ChemFailure('invalid-input', `Formula "${whole}": a number cannot follow "(".`);
      stack.push({});
    } else if (m[1] === ')') {
      const inner = stack.pop();
      if (!inner || stack.length === 0)
        throw new ChemFailure('invalid-input', `Formula "${whole}": unbalanced ")".`);
      add(stack[stack.length - 1], inner, n);
    } else {
      if (!Object.hasOwn(ATOMIC_WEIGHTS, m[1]))
        throw new ChemFailure('invalid-input', `Formula "${whole}": unknown element ${m[1]}.`);
      add(stack[stack.length - 1], { [m[1]]: 1 }, n);
    }
  }
  if (stack.length !== 1) throw new ChemFailure('invalid-input', `Formula "${whole}": unbalanced "(".`);
  return stack[0];
}

function add(into: Record<string, number>, from: Record<string, number>, times: number): void {
  for (const [el, n] of Object.entries(from)) into[el] = (into[el] ?? 0) + n * times;
}

/** Molar mass in g/mol: Σ n_el · atomic weight. */
export function formulaWeight(formula: string): number {
  const counts = parseFormula(formula);
  return Object.entries(counts).reduce((sum, [el, n]) => sum + n * ATOMIC_WEIGHTS[el], 0);
}

/** Molar mass of a formula as a typed result (bad formulas give `{ ok: false }`). */
export function molarMass(
  formula: string,
): ChemResult<{ formula: string; molarMass: number; elements: Record<string, number> }> {
  if (typeof formula !== 'string' || formula.length === 0 || formula.length > 200) {
    return {
      ok: false,
      error: { code: 'invalid-input', message: 'Give a chemical formula such as "Na2HPO4·7H2O".' },
    };
  }
  return guard(() => ({ formula, molarMass: formulaWeight(formula), elements: parseFormula(formula) }));
}
