// The look every chart shares: Bellwether's ink, lines and accent (tailwind.config.ts), written as
// plain values because SVG attributes cannot read CSS classes once exported.
export const chartTheme = {
  ink: '#1b2224',
  inkMuted: '#4f5a5c',
  inkFaint: '#7a8587',
  grid: '#e4e8e6',
  axis: '#b9c1bd',
  accent: '#0f5c58',
  accentSoft: '#acd5d0',
  warn: '#a86d00',
  warnSoft: '#fdf6e6',
  danger: '#b3261e',
  fontSize: 11,
  titleSize: 12,
} as const;
