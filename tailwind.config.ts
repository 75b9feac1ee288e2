import type { Config } from 'tailwindcss';

/*
 * Seedwake's design tokens. The identity is a soil profile: the page is pale silt,
 * text and solid controls are humus, secondary text is loam, ochre clay marks focus
 * and the deep horizon, seed-coat russet marks seeds and links, and a single living
 * green is kept for plants. Contrast ratios against silt-50 (WCAG 2.x relative
 * luminance): humus-900 16.1, loam-700 8.3, loam-600 6.3, russet-700 8.1,
 * danger-700 7.1, clay-700 5.7, clay-600 4.2 (used only for focus rings and large
 * marks, where 3:1 is the bar). Tailwind 4 loads this file through `@config` in
 * client/src/styles/app.css.
 */
const colors = {
  // The page and surfaces: pale mineral silt, from lightest to the colour of dry subsoil.
  silt: {
    50: '#fbf8f2',
    100: '#f5efe4',
    200: '#ebe2d2',
    300: '#dccfb9',
    400: '#c3b39a',
  },
  // The dark organic top horizon: body text, solid buttons, the header band.
  humus: {
    700: '#46352a',
    800: '#33261c',
    900: '#241a13',
    950: '#17110c',
  },
  // The mineral topsoil: secondary text, borders, the shallow seedbank layer.
  loam: {
    300: '#c4b19c',
    400: '#a89077',
    500: '#8a705a',
    600: '#6f5744',
    700: '#5b4636',
  },
  // Ochre clay of the subsoil: the deep seedbank layer, focus rings, highlights.
  clay: {
    100: '#f4e6c8',
    300: '#e0bd80',
    500: '#c08a3e',
    600: '#a36d25',
    700: '#86591c',
    800: '#6e4a17',
  },
  // The seed coat: seeds in the motif, links, selected states.
  russet: {
    100: '#f7e2d8',
    200: '#eec3b0',
    500: '#b8532f',
    600: '#9c3d22',
    700: '#83321c',
    800: '#6a2816',
  },
  // The one living green, for plants only (emergence, the stand, sprouts in the motif).
  sprout: {
    100: '#dfeddb',
    500: '#4b8f52',
    600: '#347340',
    700: '#2a5f34',
    800: '#1f4a28',
  },
  // Problems the person must act on; kept apart from russet so errors never read as seeds.
  danger: {
    50: '#fbe9e5',
    200: '#f0b9ae',
    700: '#a1261b',
  },
} as const;

export default {
  content: ['./client/index.html', './client/src/**/*.{ts,tsx}'],
  theme: {
    extend: {
      colors,
      fontFamily: {
        // Fraunces for headings: an old-style serif with an optical-size axis, so large
        // headings get sharper, livelier shapes than text sizes would.
        display: ['"Fraunces Variable"', 'Georgia', 'serif'],
        sans: ['"IBM Plex Sans"', 'system-ui', 'sans-serif'],
        // Seeds, ids and snapshots: every character distinct (0/O, 1/l).
        mono: ['"IBM Plex Mono"', 'ui-monospace', 'monospace'],
      },
      borderRadius: {
        // Slightly rounded like a seed, never pill-shaped.
        seed: '0.375rem',
      },
      boxShadow: {
        // A low, warm shadow: a sheet lying on soil, not floating above it.
        sheet: '0 1px 0 0 rgb(36 26 19 / 0.06), 0 6px 18px -10px rgb(36 26 19 / 0.35)',
      },
      backgroundImage: {
        // The horizon rule under the header: humus over loam over clay, as in a core.
        horizon: `linear-gradient(to bottom, ${colors.humus[900]} 0 45%, ${colors.loam[600]} 45% 75%, ${colors.clay[500]} 75% 100%)`,
      },
      maxWidth: {
        page: '72rem',
      },
    },
  },
} satisfies Config;
