// Number formatting for recipe sheets: sensible significant figures and units that fit the size.

export function sig(x: number, digits = 4): string {
  if (!Number.isFinite(x)) return String(x);
  if (x === 0) return '0';
  const magnitude = Math.floor(Math.log10(Math.abs(x)));
  const decimals = Math.max(0, digits - 1 - magnitude);
  return x.toFixed(Math.min(decimals, 12));
}

export function mass(grams: number): string {
  if (grams >= 1) return `${sig(grams)} g`;
  if (grams >= 1e-3) return `${sig(grams * 1e3)} mg`;
  return `${sig(grams * 1e6)} µg`;
}

export function volume(litres: number): string {
  if (litres >= 1) return `${sig(litres)} L`;
  if (litres >= 1e-3) return `${sig(litres * 1e3)} mL`;
  return `${sig(litres * 1e6)} µL`;
}

export function amount(moles: number): string {
  if (moles >= 1) return `${sig(moles)} mol`;
  if (moles >= 1e-3) return `${sig(moles * 1e3)} mmol`;
  return `${sig(moles * 1e6)} µmol`;
}

export function molar(conc: number): string {
  if (conc >= 1) return `${sig(conc)} M`;
  if (conc >= 1e-3) return `${sig(conc * 1e3)} mM`;
  return `${sig(conc * 1e6)} µM`;
}
