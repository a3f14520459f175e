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
