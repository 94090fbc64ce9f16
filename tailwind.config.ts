import type { Config } from 'tailwindcss'

// Graphite neutrals with a single teal-cyan accent ("slate water"), chosen to stay clear of any
// equipment maker's livery.
export default {
  content: [
    './components/**/*.{vue,ts}',
    './layouts/**/*.vue',
    './pages/**/*.vue',
    './composables/**/*.ts',
    './app.vue',
    './error.vue',
  ],
  theme: {
    extend: {
      colors: {
        graphite: {
          50: '#f6f7f8', 100: '#eceef0', 200: '#d5d9de', 300: '#b1b8c1', 400: '#87909c',
          500: '#68717e', 600: '#535a66', 700: '#444a53', 800: '#3a3f46', 900: '#25282d', 950: '#17191c',
        },
        accent: {
          50: '#ecfcfd', 100: '#cff5f9', 200: '#a5eaf3', 300: '#68d9e9', 400: '#25bfd7', 500: '#0aa2bc',
          600: '#0b819e', 700: '#116880', 800: '#175569', 900: '#184759', 950: '#0a2e3d',
        },
      },
      fontFamily: { sans: ['Inter', 'system-ui', 'sans-serif'] },
      minHeight: { touch: '2.75rem' },
      minWidth: { touch: '2.75rem' },
    },
  },
  plugins: [],
} satisfies Config
