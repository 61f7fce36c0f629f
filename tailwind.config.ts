import type { Config } from 'tailwindcss';

// Colours are named by role so screens never pick raw hues; every text pair meets WCAG AA.
export default {
  content: ['./index.html', './src/**/*.{ts,tsx}'],
  theme: {
    extend: {
      colors: {
        surface: { DEFAULT: '#f3f5f4', raised: '#ffffff', sunken: '#e8ecea' },
        ink: { DEFAULT: '#15201b' },
        muted: { DEFAULT: '#4f5c56' },
        line: { DEFAULT: '#d3dad6', strong: '#6d7a74' },
        accent: { DEFAULT: '#13627a', strong: '#0d4a5c', soft: '#e0eff3', fg: '#ffffff' },
        danger: { DEFAULT: '#a4261c', strong: '#841c14', soft: '#fbe9e7', fg: '#ffffff' },
        warn: { DEFAULT: '#8a5300', soft: '#fff3d9' },
        ok: { DEFAULT: '#1f6a3c', soft: '#e4f3e8' },
      },
      fontFamily: {
        sans: ['"IBM Plex Sans"', 'system-ui', '-apple-system', 'Segoe UI', 'sans-serif'],
      },
      minHeight: { touch: '2.75rem' },
      minWidth: { touch: '2.75rem' },
      boxShadow: { raised: '0 1px 2px rgb(21 32 27 / 0.08), 0 2px 8px rgb(21 32 27 / 0.06)' },
    },
  },
} satisfies Config;
