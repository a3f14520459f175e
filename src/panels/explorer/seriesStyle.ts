/**
 * Colours of the cells in a sweep (one per cell, in sweep order): the eight colours of the Okabe–Ito
 * palette (M. Okabe and K. Ito, "Color Universal Design (CUD): how to make figures and presentations
 * that are friendly to colorblind people", 2002), which stay apart under the common colour-vision
 * deficiencies. The order puts first the ones with at least 3:1 contrast on the white plot (WCAG 2.1,
 * success criterion 1.4.11); every marker also carries a dark outline, and the processes of a sweep
 * differ by marker shape as a second cue. test/canvas/colourVision.test.ts checks both.
 */
export const SERIES_COLOURS = [
  '#0072B2', // blue
  '#D55E00', // vermillion
  '#009E73', // bluish green
  '#CC79A7', // reddish purple
  '#000000', // black
  '#E69F00', // orange
  '#56B4E9', // sky blue
  '#F0E442', // yellow
] as const;

/** How many of the series colours reach 3:1 on the plot's white by themselves (the rest lean on the outline). */
export const SERIES_COLOURS_WITH_CONTRAST = 5;

export function seriesColour(index: number): string {
  return SERIES_COLOURS[index % SERIES_COLOURS.length] ?? '#0072B2';
}
