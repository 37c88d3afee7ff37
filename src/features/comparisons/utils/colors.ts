// Colours of the profiles in a comparison: categorical and colour-blind safe, never the pH scale
// (which stays for pH only). The order follows Okabe & Ito, "Color Universal Design" (2002/2008),
// without its yellow (too pale on white); past seven profiles the colours repeat with a dash pattern,
// so every line stays distinguishable in print and for every kind of colour vision.
const palette = ['#0072B2', '#D55E00', '#009E73', '#CC79A7', '#E69F00', '#56B4E9', '#000000'] as const;
const dashes = [undefined, '6 3', '2 3', '8 3 2 3'] as const;

export type ProfileStyle = { color: string; dash: string | undefined };

export function profileStyle(index: number): ProfileStyle {
  return {
    color: palette[index % palette.length],
    dash: dashes[Math.floor(index / palette.length) % dashes.length],
  };
}

/** One style per profile key, in the order the profiles were chosen. */
export function profileStyles(keys: readonly string[]): Record<string, ProfileStyle> {
  return Object.fromEntries(keys.map((key, i) => [key, profileStyle(i)]));
}

/**
 * Labels of the curves: the variant alone when every profile comes from one study (the study is
 * then said once, above), else "variant — study" as the API names them.
 */
export function curveLabels(
  rows: { key: string; variantName: string; studyName: string }[],
): Record<string, string> {
  const single = new Set(rows.map((r) => r.studyName)).size <= 1;
  return Object.fromEntries(
    rows.map((r) => [r.key, single ? r.variantName : `${r.variantName} — ${r.studyName}`]),
  );
}
