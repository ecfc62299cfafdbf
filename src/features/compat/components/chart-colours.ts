/**
 * Chart strokes as hex (SVG needs them literally), from the palette of tailwind.config.ts. The
 * verdict colours are kept out of the lines so a line never reads as a verdict; original and
 * substitute differ by dash as well as by legend, never by colour alone.
 */
export const CHART = {
  charging: '#0f6b6b', // accent
  cranking: '#6b4fa6',
  available: '#0f6b6b', // accent
  required: '#1d2733', // ink
  reserve: '#0f6b6b',
  shortfall: '#b3261e', // nogo: a shortfall is a fault
  limit: '#b3261e',
  grid: '#d9ddd6',
  axis: '#4a5868', // ink-soft
} as const;

export const ORIGINAL_DASH = '6 4';
