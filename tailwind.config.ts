import type { Config } from 'tailwindcss';

// Coldknit's own palette: cold slate and frost for the rooms, a warm callus amber for progress,
// a clear ice blue for freeze and an ember red for heat. Names are ours, chosen for contrast (AA on paper).
export default {
  content: ['./index.html', './src/**/*.{ts,tsx}'],
  theme: {
    extend: {
      colors: {
        paper: '#f6f4ee',
        ink: { DEFAULT: '#1c2630', soft: '#44525e' },
        slate: { DEFAULT: '#2e4152', deep: '#1f2e3b' },
        frost: { DEFAULT: '#dbe8ee', deep: '#a9c6d3' },
        moss: { DEFAULT: '#35684f', deep: '#264d3a', light: '#d7e8dc' },
        callus: { DEFAULT: '#a8601a', light: '#f6e3c8' },
        ice: { DEFAULT: '#1f5fa8', light: '#dbe9fb' },
        ember: { DEFAULT: '#b3261e', light: '#fbe1de' },
      },
      fontFamily: {
        sans: ['"Atkinson Hyperlegible"', 'system-ui', 'sans-serif'],
        mono: ['"JetBrains Mono"', 'ui-monospace', 'monospace'],
      },
    },
  },
} satisfies Config;
