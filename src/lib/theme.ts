import tailwindConfig from '../../tailwind.config';

/**
 * The design tokens for places that need a colour value rather than a class (chart strokes).
 * Read from the Tailwind config so the palette lives in exactly one file.
 */
export const colors = tailwindConfig.theme.extend.colors;
