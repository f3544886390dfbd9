import type { Config } from 'tailwindcss'

// A calm, typographic palette of our own: ink on paper, one slate-teal accent.
export default {
  content: ['./components/**/*.vue', './layouts/**/*.vue', './pages/**/*.vue', './app.vue', './composables/**/*.ts', './stores/**/*.ts'],
  theme: {
    extend: {
      fontFamily: { serif: ['"Source Serif 4"', 'Georgia', 'serif'] },
      colors: {
        ink: { DEFAULT: '#1f2328', soft: '#4a5058', faint: '#8a9099' },
        paper: { DEFAULT: '#fbfaf7', deep: '#f2efe8' },
        accent: { DEFAULT: '#2f6f73', dark: '#245659', light: '#dcebea' },
        warn: { DEFAULT: '#9a4a1c', light: '#f6e6da' },
      },
    },
  },
} satisfies Config
