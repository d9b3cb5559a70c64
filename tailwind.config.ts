import type { Config } from 'tailwindcss';

/**
 * Spanwise design system: one place for colour, type, spacing and radii.
 * Palette is our own: a timber-brown primary, warm neutral "sand" scale and clear status colours.
 * Text pairs used in the UI were chosen for WCAG 2.x AA contrast (≥ 4.5:1 for body text).
 */
const config: Config = {
  content: ['./index.html', './src/**/*.{ts,tsx}'],
  theme: {
    // Replace (not extend) the colour palette so only our tokens exist.
    colors: {
      transparent: 'transparent',
      current: 'currentColor',
      white: '#ffffff',
      black: '#000000',
      timber: {
        50: '#f8f2ec',
        100: '#efe2d4',
        200: '#dfc4a8',
        300: '#c9a079',
        400: '#a97a50',
        500: '#8c5f38',
        600: '#744b2b', // primary on white: 7.6:1
        700: '#5e3c23',
        800: '#472d1b',
        900: '#321f13',
      },
      sand: {
        50: '#fbf9f6',
        100: '#f4f0ea',
        200: '#e7e0d5',
        300: '#d4cabb',
        400: '#a99b88',
        500: '#7a6d5d', // secondary text on white: 5.1:1
        600: '#5f5448',
        700: '#463e35',
        800: '#2f2a24',
        900: '#1e1a16', // body text
      },
      success: { 50: '#ecf6ef', 200: '#b6dcc2', 700: '#1f6b3f', 800: '#175231' },
      warning: { 50: '#fdf5e3', 200: '#f1d79a', 700: '#7f5300', 800: '#624000' },
      danger: { 50: '#fcefed', 200: '#f2bcb4', 600: '#b4281a', 700: '#962014', 800: '#741a10' },
      info: { 50: '#ebf3f9', 200: '#b4d2e8', 700: '#1b5a86', 800: '#15476a' },
      focus: '#2f6fb0',
      // The CSI ramp, lightest to darkest in order of severity: cool and pale while a member has
      // room, warm and dark as it nears capacity; red (and hatched) when it fails.
      csi: { 1: '#dbe7f0', 2: '#a9c6de', 3: '#d99a2b', 4: '#b86614', 5: '#b4281a' },
    },
    fontFamily: {
      sans: ['Inter', 'system-ui', 'sans-serif'],
      mono: ['"JetBrains Mono"', 'ui-monospace', 'monospace'],
    },
    extend: {
      fontSize: {
        // Calm type scale (≈1.2 ratio); body at 0.9375 rem reads well on dense tables.
        xs: ['0.75rem', { lineHeight: '1rem' }],
        sm: ['0.875rem', { lineHeight: '1.25rem' }],
        base: ['0.9375rem', { lineHeight: '1.5rem' }],
        lg: ['1.125rem', { lineHeight: '1.625rem' }],
        xl: ['1.375rem', { lineHeight: '1.875rem' }],
        '2xl': ['1.75rem', { lineHeight: '2.25rem' }],
      },
      borderRadius: { sm: '0.25rem', DEFAULT: '0.375rem', md: '0.5rem', lg: '0.75rem' },
      boxShadow: {
        card: '0 1px 2px rgb(30 26 22 / 0.06), 0 1px 3px rgb(30 26 22 / 0.08)',
        dialog: '0 12px 32px rgb(30 26 22 / 0.22)',
      },
      maxWidth: { page: '80rem' },
    },
  },
};

export default config;
