// How a recipe supplies the strong charge S (mol/L) that the charge balance asks for at the target
// pH: by mixing two forms, x = (S/C − q_acid)/(q_base − q_acid), or by titrating one form,
// n/V = (S − C·q_form)/q_titrant (forms.ts explains q).
import { apparentPKa } from './activity';
import type { Environment } from './equilibrium';
import { findForm, formCharge, formIonsPerUnit, mixCandidates, TITRANT_ION } from './forms';
import type { BufferForm, BufferSystem, Titrant } from './library';
import { formComponent, type DraftComponent } from './recipe-components';
import type { RecipeInput } from './recipe-types';
import { ChemFailure } from './result';
import type { StrongIon } from './solution';

export interface Plan {
  /** Strong ions for a given required strong charge S (mol/L) at fixed composition of buffer. */
  ions: () => Partial<Record<StrongIon, number>>;
  describe: () => DraftComponent[];
}

export function nearestStep(system: BufferSystem, pKa: number[], pH: number, env: Environment): number {
  // A rough I (0.05 M) only to pick the step; the final check uses the solved pK″.
  const approx = pKa.map((p, i) => apparentPKa(p, system.ionizations[i].zAcid, 0.05, env.celsius, env.model));
  let best = 0;
  approx.forEach((p, i) => {
    if (Math.abs(p - pH) < Math.abs(approx[best] - pH)) best = i;
  });
  return best;
}

function scaleIons(
  perUnit: Partial<Record<StrongIon, number>>,
  factor: number,
  into: Partial<Record<StrongIon, number>>,
) {
  for (const [ion, n] of Object.entries(perUnit)) {
    const key = ion as StrongIon;
    into[key] = (into[key] ?? 0) + (n ?? 0) * factor;
  }
}

export function mixPlan(system: BufferSystem, k: number, C: number, S: number, input: RecipeInput): Plan {
  const preferred = input.forms ?? system.ionizations[k].mixFormIds;
  const candidates = input.forms
    ? [[findForm(system, input.forms[0]), findForm(system, input.forms[1])] as [BufferForm, BufferForm]]
    : mixCandidates(system, preferred);
  if (candidates.length === 0) {
    throw new ChemFailure(
      'impossible-recipe',
      `${system.name} has no pair of forms to mix; use the titration method.`,
    );
  }
  const need = S / C;
  for (const [acid, base] of candidates) {
    const qa = formCharge(acid);
    const qb = formCharge(base);
    if (qb === qa) continue;
    const x = (need - qa) / (qb - qa);
    if (x < -1e-9 || x > 1 + 1e-9) continue;
    const xb = Math.min(1, Math.max(0, x));
    return {
      ions: () => {
        const ions: Partial<Record<StrongIon, number>> = {};
        scaleIons(formIonsPerUnit(acid), C * (1 - xb), ions);
        scaleIons(formIonsPerUnit(base), C * xb, ions);
        return ions;
      },
      describe: () => [
        formComponent('acid-form', acid, (C * (1 - xb)) / acid.unitsPerFormula),
        formComponent('base-form', base, (C * xb) / base.unitsPerFormula),
      ],
    };
  }
  const names = candidates[0].map((f) => f.name).join(' and ');
  throw new ChemFailure(
    'impossible-recipe',
    `pH ${input.pH} cannot be reached by mixing ${input.forms ? names : `forms of ${system.name}`}; try the titration method.`,
  );
}

export function titrationPlan(
  system: BufferSystem,
  k: number,
  C: number,
  S: number,
  input: RecipeInput,
): Plan {
  const preset = system.ionizations[k].titration;
  const start = input.startForm
    ? findForm(system, input.startForm)
    : preset
      ? findForm(system, preset.startFormId)
      : closestForm(system, S / C);
  const q = formCharge(start);
  const perLitre = S - C * q;
  const presetTitrant = preset && preset.startFormId === start.id ? preset.titrant : undefined;
  let titrant: Titrant = input.titrant ?? presetTitrant ?? (perLitre >= 0 ? 'NaOH' : 'HCl');
  if (Math.sign(TITRANT_ION[titrant].charge) !== Math.sign(perLitre) && perLitre !== 0) {
    if (input.titrant) {
      throw new ChemFailure(
        'impossible-recipe',
        `${start.name} alone is already ${perLitre > 0 ? 'below' : 'above'} pH ${input.pH}: ${titrant} would move it the wrong way.`,
      );
    }
    titrant = perLitre > 0 ? (system.forms.some((f) => f.counterIons.K > 0) ? 'KOH' : 'NaOH') : 'HCl';
  }
  const t = TITRANT_ION[titrant];
  const nPerLitre = perLitre / t.charge;
  return {
    ions: () => {
      const ions: Partial<Record<StrongIon, number>> = {};
      scaleIons(formIonsPerUnit(start), C, ions);
      ions[t.ion] = (ions[t.ion] ?? 0) + nPerLitre;
      return ions;
    },
    describe: () => [
      formComponent('start-form', start, C / start.unitsPerFormula),
      {
        role: 'titrant',
        id: titrant,
        name: titrant,
        formula: titrant,
        formulaWeight: null,
        moles: nPerLitre,
        grams: null,
      },
    ],
  };
}

function closestForm(system: BufferSystem, need: number): BufferForm {
  return [...system.forms].sort((a, b) => Math.abs(formCharge(a) - need) - Math.abs(formCharge(b) - need))[0];
}
