import Flatbush from 'flatbush';
import { bottom, right, type Rect } from './rect';

/**
 * A static spatial index over rectangles (a packed Hilbert R-tree from the flatbush package), so that
 * "what lies under this point" or "who touches this box" costs O(log n): hit-testing on the canvas and
 * the live preview's queries. A whole-die evaluation finds all neighbours at once with neighbourGrid.ts.
 */
export interface SpatialIndex {
  /** Indices of the rectangles whose boxes meet the query box grown by `margin` on every side. */
  near(rect: Rect, margin: number): number[];
}

export function buildSpatialIndex(rects: readonly Rect[]): SpatialIndex {
  if (rects.length === 0) return { near: () => [] };
  const index = new Flatbush(rects.length);
  for (const r of rects) index.add(r.x, r.y, right(r), bottom(r));
  index.finish();
  return {
    near: (rect, margin) =>
      index.search(rect.x - margin, rect.y - margin, right(rect) + margin, bottom(rect) + margin),
  };
}
