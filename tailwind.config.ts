import type { Config } from 'tailwindcss';

/**
 * Thawline's palette, taken from northern ground (see design-language.md in the team's shared notes):
 * ink for text, sea-ice and snow greys for surfaces, permafrost blue for frozen ground and primary
 * actions, thaw ochre for thawed ground, lichen green for calm states, one alert rust. Text pairs are
 * checked for WCAG 2.2 AA contrast in tests/unit/palette.test.ts.
 */
const config: Config = {
  content: ['./app/**/*.{ts,tsx}', './components/**/*.{ts,tsx}'],
  theme: {
    extend: {
      colors: {
        ink: { DEFAULT: '#15212c', soft: '#3b4a56', muted: '#56646f' },
        ice: { DEFAULT: '#f6f8f9', raised: '#ffffff' },
        snow: { 100: '#eef2f4', 200: '#dde4e8', 300: '#c3ced5', 500: '#8796a1' },
        frost: { DEFAULT: '#1d5a85', strong: '#15435f', pale: '#dbe8f1' },
        thaw: { DEFAULT: '#9a5a14', fill: '#d99a48', pale: '#f6e7d2' },
        lichen: { DEFAULT: '#466e33', pale: '#e2ecd9' },
        rust: { DEFAULT: '#9e3519', pale: '#f5dfd7' },
      },
      fontFamily: {
        sans: ['var(--font-noto)', 'var(--font-noto-syllabics)', 'system-ui', 'sans-serif'],
      },
    },
  },
};

export default config;
