// Bellwether's theme: calm and dense. A light neutral canvas, dark ink, ONE accent (deep teal),
// amber only for warnings and red only for errors. Colours are Bellwether's own.
import type { Config } from 'tailwindcss';

export default {
  content: ['./index.html', './src/**/*.{ts,tsx}'],
  theme: {
    extend: {
      fontFamily: {
        sans: ['"Source Sans 3"', 'ui-sans-serif', 'system-ui', 'sans-serif'],
        mono: ['ui-monospace', 'SFMono-Regular', 'Menlo', 'Consolas', 'monospace'],
      },
      colors: {
        canvas: '#f5f6f4',
        surface: '#ffffff',
        ink: { DEFAULT: '#1b2224', muted: '#4f5a5c', faint: '#7a8587' },
        line: { DEFAULT: '#d8ddda', strong: '#b9c1bd' },
        accent: {
          50: '#eef6f5',
          100: '#d6ebe8',
          200: '#acd5d0',
          300: '#7bb9b3',
          500: '#2b8079',
          600: '#176d67',
          700: '#0f5c58',
          800: '#0b4845',
          900: '#083633',
        },
        warn: { 50: '#fdf6e6', 200: '#efd08a', 600: '#a86d00', 800: '#6b4500' },
        danger: { 50: '#fcefed', 200: '#efbdb6', 600: '#b3261e', 800: '#7d1a15' },
      },
      fontSize: {
        // Dense screens: 14 px body with generous line height.
        sm: ['0.8125rem', { lineHeight: '1.25rem' }],
        base: ['0.875rem', { lineHeight: '1.375rem' }],
      },
      maxWidth: { page: '80rem' },
    },
  },
} satisfies Config;
