import type { Config } from 'tailwindcss';

// Dutywise's own tokens: graphite ink on warm paper, a copper accent for heat duties,
// a deep teal for compression, and severity colours checked for WCAG AA on paper.
const config: Config = {
  content: ['./app/**/*.{ts,tsx}', './lib/**/*.{ts,tsx}', './emails/**/*.{ts,tsx}'],
  theme: {
    extend: {
      colors: {
        ink: { DEFAULT: '#1c232b', soft: '#3b4653', muted: '#5c6773', faint: '#8b949e' },
        paper: { DEFAULT: '#f6f4ef', raised: '#ffffff', sunk: '#ece8df', line: '#d9d3c7' },
        copper: { 50: '#fbf1ea', 100: '#f5dcc9', 500: '#b4562b', 600: '#9a4621', 700: '#7c3819' },
        tide: { 50: '#e9f4f4', 100: '#cbe5e6', 500: '#1d6a72', 600: '#16565d', 700: '#114449' },
        severity: { info: '#1f5f99', caution: '#8a6100', warning: '#a3430f', danger: '#a3162b' },
      },
      fontFamily: {
        sans: ['var(--font-plex-sans)', 'system-ui', 'sans-serif'],
        mono: ['var(--font-plex-mono)', 'ui-monospace', 'monospace'],
      },
      fontSize: {
        'figure-xl': ['2.75rem', { lineHeight: '1.05', fontWeight: '600' }],
        'figure-lg': ['1.75rem', { lineHeight: '1.15', fontWeight: '600' }],
        label: ['0.8125rem', { lineHeight: '1.2', fontWeight: '500' }],
        hint: ['0.75rem', { lineHeight: '1.3' }],
      },
      spacing: { gutter: '1.25rem', panel: '1.5rem' },
      borderRadius: { panel: '0.625rem' },
      boxShadow: { panel: '0 1px 0 rgba(28,35,43,0.06), 0 1px 3px rgba(28,35,43,0.08)' },
    },
  },
};

export default config;
