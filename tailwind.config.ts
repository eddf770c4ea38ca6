import type { Config } from 'tailwindcss';

// Lanewright's own palette: slate ink on paper, a teal accent for actions,
// and state colours chosen to stay distinguishable for colour-blind readers.
export default {
  content: ['./index.html', './src/**/*.{ts,tsx}'],
  theme: {
    extend: {
      fontFamily: {
        sans: ['"IBM Plex Sans"', 'system-ui', 'sans-serif'],
      },
      colors: {
        ink: { DEFAULT: '#1d2430', soft: '#4a5568', faint: '#8a94a6' },
        paper: { DEFAULT: '#f7f6f2', raised: '#ffffff', sunk: '#ecebe5' },
        accent: { DEFAULT: '#0f766e', strong: '#115e59', soft: '#ccfbf1' },
        danger: { DEFAULT: '#b42318', soft: '#fee4e2' },
        caution: { DEFAULT: '#b54708', soft: '#fef0c7' },
        state: {
          processing: '#0072b2',
          starved: '#e69f00',
          blocked: '#cc79a7',
          down: '#d55e00',
          onBreak: '#bbbbbb',
        },
      },
    },
  },
} satisfies Config;
