// Colour schemes: colour-vision-deficiency-safe categories, perceptually uniform ramps, a zero-centred diverging scheme.

/**
 * Okabe & Ito (2008) "Color Universal Design" categorical palette, reordered so that the
 * low-contrast yellow and the black come last (black is kept for outlines and fit lines).
 */
export const OKABE_ITO: readonly string[] = [
  '#E69F00', // orange
  '#56B4E9', // sky blue
  '#009E73', // bluish green
  '#0072B2', // blue
  '#D55E00', // vermillion
  '#CC79A7', // reddish purple
  '#F0E442', // yellow
  '#000000', // black
];

/** Sequential scheme (vega scheme name) for concentrations: viridis, perceptually uniform and CVD-safe. */
export const SEQUENTIAL_SCHEME = 'viridis';

/** Alternative sequential scheme (vega scheme name): cividis, designed to look alike to deuteranopes and normal vision. */
export const SEQUENTIAL_ALT_SCHEME = 'cividis';

/**
 * Diverging scheme (vega scheme name) for residuals, centred on zero: blue–orange varies along the
 * blue–yellow axis that red–green colour-deficient viewers keep, unlike red–green or red–blue–green ramps.
 */
export const DIVERGING_SCHEME = 'blueorange';

/** Neutral greys of the house look: land fill, land outline, graticule, text. */
export const NEUTRALS = {
  land: '#d9d6cf',
  landStroke: '#8c8880',
  graticule: '#b5b5b5',
  ocean: '#ffffff',
  text: '#222222',
  missing: '#f2f2f2',
} as const;

/** The categorical colour for the i-th category (cycles after eight). */
export function categoricalColour(i: number): string {
  return OKABE_ITO[((i % OKABE_ITO.length) + OKABE_ITO.length) % OKABE_ITO.length];
}
