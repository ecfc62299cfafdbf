import type { Config } from 'tailwindcss';

/**
 * Arcwise's look: calm slate surfaces, one deep teal accent, verdict colours that always come
 * with a word and an icon. Tailwind 4 reads this through `@config` in src/index.css.
 */
export default {
  content: ['./index.html', './src/**/*.{ts,tsx}'],
  theme: {
    extend: {
      fontFamily: {
        sans: ['"Inter Variable"', 'ui-sans-serif', 'system-ui', 'sans-serif'],
        mono: ['ui-monospace', 'SFMono-Regular', 'Menlo', 'monospace'],
      },
      colors: {
        // faint is the lightest text still at WCAG AA 4.5:1 on paper and paper-sunk (axe color-contrast).
        ink: { DEFAULT: '#1d2733', soft: '#4a5868', faint: '#5e6b7b' },
        paper: { DEFAULT: '#f6f7f5', raised: '#ffffff', sunk: '#eceeea' },
        accent: { DEFAULT: '#0f6b6b', strong: '#0a5050', soft: '#d7ecea' },
        go: { DEFAULT: '#1f7a3d', soft: '#e0f1e5' },
        review: { DEFAULT: '#875500', soft: '#fbefd6' },
        nogo: { DEFAULT: '#b3261e', soft: '#f8e0de' },
      },
    },
  },
} satisfies Config;
