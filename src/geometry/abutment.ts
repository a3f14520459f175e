import type { Boxes } from './blockTable';
import type { Interval } from './interval';
import { ABUTMENT_TOLERANCE, bottom, right, type Rect } from './rect';

export type Side = 'top' | 'bottom' | 'left' | 'right';

/**
 * The stretch of `target`'s side that `neighbour` covers by abutment, measured from the side's start
 * (its left end for top/bottom, its top end for left/right), or null when they do not abut there.
 * Abutment means the facing edges lie within {@link ABUTMENT_TOLERANCE} and the two overlap along the edge.
 */
export function abutmentOnSide(target: Rect, neighbour: Rect, side: Side): Interval | null {
  const tol = ABUTMENT_TOLERANCE;
  let touching: boolean;
  switch (side) {
    case 'top':
      touching = Math.abs(bottom(neighbour) - target.y) <= tol;
      break;
    case 'bottom':
      touching = Math.abs(neighbour.y - bottom(target)) <= tol;
      break;
    case 'left':
      touching = Math.abs(right(neighbour) - target.x) <= tol;
      break;
    case 'right':
      touching = Math.abs(neighbour.x - right(target)) <= tol;
      break;
  }
  if (!touching) return null;
  const horizontalEdge = side === 'top' || side === 'bottom';
  const start = horizontalEdge
    ? Math.max(target.x, neighbour.x) - target.x
    : Math.max(target.y, neighbour.y) - target.y;
  const end = horizontalEdge
    ? Math.min(right(target), right(neighbour)) - target.x
    : Math.min(bottom(target), bottom(neighbour)) - target.y;
  return end - start > tol ? { start, end } : null;
}

/** Length of a rectangle's side (m). */
export function sideLength(rect: Rect, side: Side): number {
  return side === 'top' || side === 'bottom' ? rect.width : rect.height;
}

/**
 * {@link abutmentOnSide} for two boxes of a table, without allocating: when box `neighbour` abuts side
 * `side` of box `target`, writes the covered stretch (from the side's start, m) to `out[at]` and
 * `out[at + 1]` and returns true. The arithmetic is the same, so both give the same answer.
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
