import { boxesOf, type Boxes } from './blockTable';
import type { Interval } from './interval';
import { ABUTMENT_TOLERANCE, type Rect } from './rect';

export type Side = 'top' | 'bottom' | 'left' | 'right';

/**
 * The stretch of `target`'s side that `neighbour` covers by abutment, measured from the side's start
 * (its left end for top/bottom, its top end for left/right), or null when they do not abut there.
 * Abutment means the facing edges lie within {@link ABUTMENT_TOLERANCE} and the two overlap along the edge.
 */
export function abutmentOnSide(target: Rect, neighbour: Rect, side: Side): Interval | null {
  const stretch = new Float64Array(2);
  if (!abutmentSpan(boxesOf([target, neighbour]), 0, 1, side, stretch, 0)) return null;
  return { start: stretch[0] as number, end: stretch[1] as number };
}

/** Length of a rectangle's side (m). */
export function sideLength(rect: Rect, side: Side): number {
  return side === 'top' || side === 'bottom' ? rect.width : rect.height;
}

/**
 * {@link abutmentOnSide} for two boxes of a table, without allocating: when box `neighbour` abuts side
 * `side` of box `target`, writes the covered stretch (from the side's start, m) to `out[at]` and
 * `out[at + 1]` and returns true.
 */
export function abutmentSpan(
  boxes: Boxes,
  target: number,
  neighbour: number,
  side: Side,
  out: Float64Array,
  at: number,
): boolean {
  const tol = ABUTMENT_TOLERANCE;
  const tx = boxes.x[target] as number;
  const ty = boxes.y[target] as number;
  const tr = tx + (boxes.width[target] as number);
  const tb = ty + (boxes.height[target] as number);
  const nx = boxes.x[neighbour] as number;
  const ny = boxes.y[neighbour] as number;
  const nr = nx + (boxes.width[neighbour] as number);
  const nb = ny + (boxes.height[neighbour] as number);
  let start: number;
  let end: number;
  if (side === 'top' || side === 'bottom') {
    if (side === 'top' ? Math.abs(nb - ty) > tol : Math.abs(ny - tb) > tol) return false;
    start = Math.max(tx, nx) - tx;
    end = Math.min(tr, nr) - tx;
  } else {
    if (side === 'left' ? Math.abs(nr - tx) > tol : Math.abs(nx - tr) > tol) return false;
    start = Math.max(ty, ny) - ty;
    end = Math.min(tb, nb) - ty;
  }
  if (!(end - start > tol)) return false;
  out[at] = start;
  out[at + 1] = end;
  return true;
}
