// The amounts of a recipe: per-litre drafts scaled to the final volume, with grams from formula
// weights, volumes of stocks, titrant and pure liquids (from density), and the salt.
import { formulaWeight } from './formula';
import type { BufferForm, BufferSystem, Salt } from './library';
import type { RecipeComponent, RecipeInput } from './recipe-types';
import { ChemFailure } from './result';
import { checkAmount } from './validate';

export type DraftComponent = Omit<RecipeComponent, 'volume' | 'stockConc'>;

/** Per-litre amounts; `withVolumes` scales them to the final volume. */
export function formComponent(
  role: RecipeComponent['role'],
  form: BufferForm,
  molesPerLitre: number,
): DraftComponent {
  return {
    role,
    id: form.id,
    name: form.name,
    formula: form.formula,
    formulaWeight: form.formulaWeight,
    moles: molesPerLitre,
    grams: molesPerLitre * form.formulaWeight,
  };
}

export function withVolumes(
  c: DraftComponent,
  V: number,
  input: RecipeInput,
  system: BufferSystem,
): RecipeComponent {
  const moles = c.moles * V;
  const grams = c.grams === null ? null : c.grams * V;
  if (c.role === 'titrant') {
    const conc =
      input.titrantConc === undefined ? 1 : checkAmount(input.titrantConc, 'Titrant concentration', true);
    return { ...c, moles, grams, volume: moles / conc, stockConc: conc };
  }
  const stock = input.stockConcs?.[c.id];
  if (stock !== undefined) {
    const conc = checkAmount(stock, `Stock concentration of ${c.name}`, true);
    return { ...c, moles, grams, volume: moles / conc, stockConc: conc };
  }
  const form = system.forms.find((f) => f.id === c.id);
  const density = form && form.state === 'liquid' ? form.density : null;
  return {
    ...c,
    moles,
    grams,
    volume: density && grams !== null ? grams / density / 1000 : null,
    stockConc: null,
  };
}

export function saltComponent(salt: Salt, conc: number, V: number): RecipeComponent {
  const fw = formulaWeight(salt);
  return {
    role: 'salt',
    id: salt,
    name: salt === 'NaCl' ? 'Sodium chloride' : 'Potassium chloride',
    formula: salt,
    formulaWeight: fw,
    moles: conc * V,
    grams: conc * V * fw,
    volume: null,
    stockConc: null,
  };
}

export function checkVolumes(components: RecipeComponent[], V: number): void {
  const liquids = components.reduce((s, c) => s + (c.volume ?? 0), 0);
  if (liquids > V * (1 + 1e-9)) {
    throw new ChemFailure(
      'impossible-recipe',
      `The stock solutions and titrant add up to ${(liquids * 1000).toFixed(1)} mL, more than the final ${(V * 1000).toFixed(1)} mL: use more concentrated stocks.`,
    );
  }
}
