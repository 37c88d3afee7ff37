// The written procedure and cautions of a recipe sheet (PRODUCT.md "Cautions the product shows").
import { amount, mass, molar, volume } from './format';
import type { BufferSystem } from './library';
import type { Recipe } from './recipe';

export const SAFETY_CAUTION =
  'Wear eye protection and gloves; add acid to water, never water to acid; follow your site’s chemical-safety rules and the suppliers’ safety data sheets.';

/** |dpKa/dT| above which the pH must be set at the assay temperature (SCIENCE.md §2.6). */
export const LARGE_DPKA_DT = 0.02;

export function recipeSteps(r: Recipe): string[] {
  const steps: string[] = [];
  const t = `${r.temperatureC} °C`;
  for (const c of r.components) {
    if (c.role === 'titrant' || c.role === 'salt') continue;
    const what = `${c.name} (${c.formula}, ${c.formulaWeight} g/mol; ${amount(c.moles)})`;
    if (c.stockConc !== null && c.volume !== null) {
      steps.push(`Add ${volume(c.volume)} of the ${molar(c.stockConc)} stock of ${what}.`);
    } else if (c.volume !== null && c.grams !== null) {
      steps.push(`Measure ${volume(c.volume)} (${mass(c.grams)}) of ${what}.`);
    } else if (c.grams !== null) {
      steps.push(`Weigh ${mass(c.grams)} of ${what}.`);
    }
  }
  steps.push(`Dissolve in about 80 % of the final volume (${volume(r.volume * 0.8)}) of water.`);
  const salt = r.components.find((c) => c.role === 'salt');
  if (salt && salt.grams !== null) {
    steps.push(
      `Add ${mass(salt.grams)} of ${salt.name} (${amount(salt.moles)}, ${molar(r.saltConc)} final).`,
    );
  }
  const titrant = r.components.find((c) => c.role === 'titrant');
  if (titrant && titrant.volume !== null && titrant.stockConc !== null) {
    steps.push(
      `Titrate with ${molar(titrant.stockConc)} ${titrant.name} to pH ${r.targetPH.toFixed(2)} at ${t}: ` +
        `about ${volume(titrant.volume)} (${amount(titrant.moles)}) is expected; add the last part slowly.`,
    );
  }
  steps.push(
    `Make up to ${volume(r.volume)} with water at ${t} and check the pH (expected ${r.targetPH.toFixed(2)}).`,
  );
  return steps;
}

export function recipeCautions(system: BufferSystem, k: number): string[] {
  const cautions = [...system.cautions];
  const slope = system.ionizations[k].dpKadT;
  if (slope !== null && Math.abs(slope) >= LARGE_DPKA_DT) {
    cautions.push(
      `${system.name} changes pKa by ${slope.toFixed(4)} per °C: set the pH at the assay temperature.`,
    );
  }
  cautions.push(SAFETY_CAUTION);
  return cautions;
}
