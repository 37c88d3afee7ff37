// The ONE continuous pH colour scale of Bellwether: acidic warm, neutral green, basic blue-violet.
// Stops are set in OKLCH (a perceptually uniform space: Björn Ottosson, "A perceptual color space
// for image processing", 2020), with the hue turning one way only (25° → 305°) so the order of the
// colours follows the order of pH, and lightness kept at or below 0.64 so every colour keeps about
// 3:1 contrast or better against white (WCAG 2.1 non-text contrast). Between stops the scale is
// linear in L, C and h; colours outside the sRGB gamut lose chroma until they fit.

export type PhStop = { pH: number; l: number; c: number; h: number };

/** Bellwether's own stops (pH → OKLCH). */
export const phScaleStops: readonly PhStop[] = [
  { pH: 0, l: 0.42, c: 0.13, h: 25 }, // deep brick
  { pH: 2.5, l: 0.54, c: 0.16, h: 40 }, // red-orange
  { pH: 4.5, l: 0.63, c: 0.14, h: 72 }, // ochre
  { pH: 7, l: 0.6, c: 0.15, h: 148 }, // green at neutral
  { pH: 9.5, l: 0.52, c: 0.12, h: 238 }, // blue
  { pH: 12, l: 0.45, c: 0.16, h: 285 }, // blue-violet
  { pH: 14, l: 0.38, c: 0.14, h: 305 }, // violet
];

export const phScaleDomain = [0, 14] as const;

/** Colour for values that are not a pH (missing, not a number). */
export const phMissingColor = '#9aa3a1';

function oklchToLinearRgb(l: number, c: number, hDeg: number): [number, number, number] {
  const h = (hDeg * Math.PI) / 180;
  const a = c * Math.cos(h);
  const b = c * Math.sin(h);
  // OKLab → LMS (cube roots) → linear sRGB, matrices from Ottosson (2020).
  const l_ = (l + 0.3963377774 * a + 0.2158037573 * b) ** 3;
  const m_ = (l - 0.1055613458 * a - 0.0638541728 * b) ** 3;
  const s_ = (l - 0.0894841775 * a - 1.291485548 * b) ** 3;
  return [
    4.0767416621 * l_ - 3.3077115913 * m_ + 0.2309699292 * s_,
    -1.2684380046 * l_ + 2.6097574011 * m_ - 0.3413193965 * s_,
    -0.0041960863 * l_ - 0.7034186147 * m_ + 1.707614701 * s_,
  ];
}

const inGamut = (rgb: number[]) => rgb.every((v) => v >= -1e-4 && v <= 1 + 1e-4);

/** sRGB transfer function (IEC 61966-2-1). */
const encode = (v: number) => {
  const x = Math.min(1, Math.max(0, v));
  return x <= 0.0031308 ? 12.92 * x : 1.055 * x ** (1 / 2.4) - 0.055;
};

export function oklchToHex(l: number, c: number, h: number): string {
  let rgb = oklchToLinearRgb(l, c, h);
  if (!inGamut(rgb)) {
    // Keep lightness and hue, lower chroma by bisection until the colour fits in sRGB.
    let lo = 0;
    let hi = c;
    for (let i = 0; i < 24; i++) {
      const mid = (lo + hi) / 2;
      if (inGamut(oklchToLinearRgb(l, mid, h))) lo = mid;
      else hi = mid;
    }
    rgb = oklchToLinearRgb(l, lo, h);
  }
  return `#${rgb
    .map((v) =>
      Math.round(encode(v) * 255)
        .toString(16)
        .padStart(2, '0'),
    )
    .join('')}`;
}

/** The scale's colour at a pH (clamped to 0–14). */
export function phColor(pH: number | null | undefined): string {
  if (pH === null || pH === undefined || !Number.isFinite(pH)) return phMissingColor;
  const x = Math.min(phScaleDomain[1], Math.max(phScaleDomain[0], pH));
  const i = Math.max(0, phScaleStops.findIndex((s) => s.pH >= x) - 1);
  const a = phScaleStops[i];
  const b = phScaleStops[Math.min(i + 1, phScaleStops.length - 1)];
  const t = b.pH === a.pH ? 0 : (x - a.pH) / (b.pH - a.pH);
  const mix = (p: number, q: number) => p + (q - p) * t;
  return oklchToHex(mix(a.l, b.l), mix(a.c, b.c), mix(a.h, b.h));
}

/** Evenly spaced colours between two pH values, for gradients (SVG or CSS). */
export function phGradient(min: number, max: number, steps = 24): { offset: number; color: string }[] {
  return Array.from({ length: steps + 1 }, (_, k) => ({
    offset: k / steps,
    color: phColor(min + ((max - min) * k) / steps),
  }));
}

/** Ink that stays readable on top of a pH colour (all stops are mid-dark, so white mostly). */
export function inkOnPh(pH: number): string {
  const hex = phColor(pH);
  const [r, g, b] = [1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16) / 255);
  const lin = (v: number) => (v <= 0.04045 ? v / 12.92 : ((v + 0.055) / 1.055) ** 2.4);
  const y = 0.2126 * lin(r) + 0.7152 * lin(g) + 0.0722 * lin(b); // relative luminance, WCAG 2.1
  return y > 0.3 ? '#1b2224' : '#ffffff';
}
