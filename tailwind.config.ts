import type { Config } from 'tailwindcss';

/** Archival palette: warm paper, ink, and one iron-gall brown accent (design §6). */
export default {
  content: ['./index.html', './src/**/*.{ts,tsx}'],
  theme: {
    extend: {
      colors: {
        paper: { DEFAULT: '#f7f2e8', deep: '#efe6d4', edge: '#ded2bb' },
        ink: { DEFAULT: '#221d17', soft: '#4a4136', faint: '#6b6052' },
        gall: { DEFAULT: '#6e4424', dark: '#532f15', light: '#f0e2d3' },
        alert: { DEFAULT: '#9b2c1c', light: '#f8e1dc' },
        ok: { DEFAULT: '#35562f', light: '#e3ecd9' },
      },
      fontFamily: {
        serif: ['"EB Garamond"', 'Georgia', 'serif'],
        sans: ['system-ui', '-apple-system', '"Segoe UI"', 'Roboto', 'sans-serif'],
      },
    },
  },
} satisfies Config;
