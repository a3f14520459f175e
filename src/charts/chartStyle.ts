import {
  symbol,
  symbolCircle,
  symbolCross,
  symbolDiamond,
  symbolSquare,
  symbolTriangle,
  symbolWye,
} from 'd3';

/** How a point is drawn: on the front, feasible, or shaded out by a constraint or a failing check. */
export type PointState = 'front' | 'feasible' | 'infeasible';

export interface ScatterDatum {
  readonly x: number;
  readonly y: number;
  readonly colour: string;
  /** Index into the marker shapes (one per series, e.g. per process). */
  readonly shape: number;
  readonly state: PointState;
}

/** Space around the plot for ticks and axis titles (px). */
export const MARGIN = { top: 16, right: 20, bottom: 46, left: 74 };
/** Marker shapes, one per series (the processes of a sweep). */
export const MARKER_SHAPES = [
  symbolCircle,
  symbolSquare,
  symbolTriangle,
  symbolDiamond,
  symbolWye,
  symbolCross,
];

/** Path of marker `shape` at the given size, for legends. */
export function markerPath(shape: number, size = 42): string {
  return symbol(MARKER_SHAPES[shape % MARKER_SHAPES.length] ?? symbolCircle, size)() ?? '';
}

/** Background of the plot area. */
export const PLOT_BACKGROUND = '#fffefb';
/**
 * Outline of every feasible marker, so that a light series colour still has a boundary of 3:1 or more
 * against the plot (WCAG 2.1, success criterion 1.4.11).
 */
export const MARKER_OUTLINE = '#1f2328';

/** Marker area (px²) of a plotted point, and the grey of infeasible points. */
export const MARKER_SIZE = 42;
export const INFEASIBLE_FILL = '#b5b9c0';
