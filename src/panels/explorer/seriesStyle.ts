/** Colours of the cells in a sweep (one per cell, in sweep order) and the grey of infeasible points. */
export const SERIES_COLOURS = [
  '#2f6db5',
  '#d0533f',
  '#2e9a5e',
  '#c98a12',
  '#7a4fb0',
  '#138a8a',
  '#a3456f',
  '#5b6b2f',
] as const;

export function seriesColour(index: number): string {
  return SERIES_COLOURS[index % SERIES_COLOURS.length] ?? '#2f6db5';
}
