// Commercial forms of a buffer in the charge balance. A form's strong counter-ions per buffer unit
// fix its place: q = (Na⁺ + K⁺ − Cl⁻)/units is the net strong charge it brings per mole of buffer
// (NaH2PO4: +1, Na2HPO4: +2, Tris·HCl: −1, free acids and bases: 0). Mixing two forms, or adding a
// strong titrant to one, must supply the strong charge S the charge balance asks for at the target.
import type { BufferForm, BufferSystem, Titrant } from './library';
import { ChemFailure } from './result';
import type { StrongIon } from './solution';
import { shown } from './validate';

export function formCharge(form: BufferForm): number {
  const c = form.counterIons;
  return (c.Na + c.K - c.Cl) / form.unitsPerFormula;
}

/** Strong ions (mol per mol of buffer unit) that a form brings. */
export function formIonsPerUnit(form: BufferForm): Partial<Record<StrongIon, number>> {
  const u = form.unitsPerFormula;
  const out: Partial<Record<StrongIon, number>> = {};
  if (form.counterIons.Na) out.Na = form.counterIons.Na / u;
  if (form.counterIons.K) out.K = form.counterIons.K / u;
  if (form.counterIons.Cl) out.Cl = form.counterIons.Cl / u;
  return out;
}

export const TITRANT_ION: Record<Titrant, { ion: StrongIon; charge: 1 | -1 }> = {
  NaOH: { ion: 'Na', charge: 1 },
  KOH: { ion: 'K', charge: 1 },
  HCl: { ion: 'Cl', charge: -1 },
};

export function findForm(system: BufferSystem, id: unknown): BufferForm {
  const form = system.forms.find((f) => f.id === id);
  if (!form) {
    const known = system.forms.map((f) => f.id).join(', ');
    throw new ChemFailure(
      'unknown-form',
      `${system.name} has no form ${shown(id)}; its forms are: ${known}.`,
    );
  }
  return form;
}

/**
 * Pairs of forms to try for a mix, the library's default first, then every other pair ordered by
 * how close their charges are (adjacent protonation states make the most precise mixes).
 */
export function mixCandidates(
  system: BufferSystem,
  preferred: [string, string] | null,
): [BufferForm, BufferForm][] {
  const pairs: [BufferForm, BufferForm][] = [];
  if (preferred) pairs.push([findForm(system, preferred[0]), findForm(system, preferred[1])]);
  const others: [BufferForm, BufferForm][] = [];
  for (const a of system.forms) {
    for (const b of system.forms) {
      if (formCharge(b) > formCharge(a) && !pairs.some(([x, y]) => x.id === a.id && y.id === b.id))
        others.push([a, b]);
    }
  }
  others.sort((p, q) => formCharge(p[1]) - formCharge(p[0]) - (formCharge(q[1]) - formCharge(q[0])));
  return [...pairs, ...others];
}
