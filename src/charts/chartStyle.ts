import {
  symbol,
  symbolCircle,
  symbolCross,
  symbolDiamond,
  symbolSquare,
  symbolTriangle,
  symbolWye,
} from 'd3';
import type { PointsPicture } from './pointsPicture';

/**
 * A scatter's points as columns: the first `count` entries of each array. Columns, not an object per
 * point, so a chart of 100,000 points costs no allocation per point and a growing one costs only its new
 * points.
 */
export interface ScatterPoints {
  /**
   * Who filled the arrays: while an update has the same source as the one before, its points are the
   * earlier ones (unchanged) followed by new ones, so what was drawn of them still holds.
   */
  readonly source: object;
  readonly count: number;
  readonly x: ArrayLike<number>;
  readonly y: ArrayLike<number>;
  /** 1 where the point is shaded out (a constraint or a failing check), drawn grey and under the rest. */
  readonly infeasible: ArrayLike<number>;
  /** Colour series of each point, coloured by `colourOf`. */
  readonly series: ArrayLike<number>;
  /** Index into the marker shapes (one per series, e.g. per process). */
  readonly shape: ArrayLike<number>;
  colourOf(series: number): string;
  /** Least and greatest finite x and y among the points (Infinity / −Infinity when there are none). */
  readonly extent: { readonly x: readonly [number, number]; readonly y: readonly [number, number] };
  /**
   * These points already drawn off the page for the chart's final (not growing) state, if someone did
   * (pointsPicture.ts): the chart puts these pixels on its canvas when they were drawn for its own
   * placement and size, instead of stamping every point.
   */
  readonly picture?: PointsPicture | null;
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
