import type { Config } from 'tailwindcss';

// The Plumbline palette, defined here once: a brass bob on a taut cord over paper.
const config: Config = {
  content: ['./app/**/*.{ts,tsx}', './components/**/*.{ts,tsx}'],
  theme: {
    extend: {
      colors: {
        ink: { DEFAULT: '#1b2430', soft: '#354152', muted: '#5d6979', faint: '#8a94a3' },
        paper: { DEFAULT: '#f6f4ef', raised: '#ffffff', sunk: '#ebe7de', rule: '#d8d2c4' },
        brass: {
          50: '#fbf5e8',
          100: '#f3e3c0',
          300: '#d8ad5b',
          500: '#a9771a',
          600: '#8a6013',
          700: '#6b4a0e',
        },
        cord: { 50: '#e8f3f4', 100: '#c8e3e6', 500: '#1f6f78', 600: '#175a62', 700: '#11454b' },
        flare: { 50: '#fbece5', 500: '#b4461a', 700: '#8a3412' },
        moss: { 50: '#e9f2ec', 500: '#2e6b4f', 700: '#214e3a' },
      },
      fontFamily: {
        sans: ['var(--font-sans)', 'system-ui', 'sans-serif'],
        mono: ['var(--font-mono)', 'ui-monospace', 'monospace'],
      },
      borderRadius: { card: '0.75rem' },
      boxShadow: { card: '0 1px 2px rgba(27,36,48,0.06), 0 2px 8px rgba(27,36,48,0.05)' },
    },
  },
};

export default config;
