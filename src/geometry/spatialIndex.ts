import Flatbush from 'flatbush';
import { bottom, boundsOf, right, type Bounds, type Rect } from './rect';

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
  return new TreeOnDemand(rects);
}

/**
 * The R-tree, built on the first query that does not take in every rectangle. A whole-floorplan view
 * (the first paint of a design, a fit) asks for every block: that answer needs no tree, and a whole die
 * (about 200,000 blocks) then opens without sorting them along the Hilbert curve first.
 */
class TreeOnDemand implements SpatialIndex {
  private tree: Flatbush | null = null;
  /** The extremes of every rectangle's edges (m). */
  private readonly bounds: Bounds;

  constructor(private readonly rects: readonly Rect[]) {
    this.bounds = boundsOf(rects);
  }

  near(rect: Rect, margin: number): number[] {
    const x0 = rect.x - margin;
    const y0 = rect.y - margin;
    const x1 = right(rect) + margin;
    const y1 = bottom(rect) + margin;
    // A box that holds the bounds of them all meets every rectangle (closed, as the tree compares).
    const { minX, minY, maxX, maxY } = this.bounds;
    if (x0 <= minX && y0 <= minY && x1 >= maxX && y1 >= maxY) {
      return Array.from({ length: this.rects.length }, (_, i) => i);
    }
    if (!this.tree) {
      this.tree = new Flatbush(this.rects.length);
      for (const r of this.rects) this.tree.add(r.x, r.y, right(r), bottom(r));
      this.tree.finish();
    }
    return this.tree.search(x0, y0, x1, y1);
  }
}

/** Most moved rectangles an index carries over its R-tree before it is built again. */
const MOST_MOVED = 256;

/** An R-tree with some of its rectangles moved since it was built: queries skip their old boxes. */
class MovedIndex implements SpatialIndex {
  constructor(
    readonly base: SpatialIndex,
    readonly moved: ReadonlyMap<number, Rect>,
  ) {}

  near(rect: Rect, margin: number): number[] {
    const hits = this.base.near(rect, margin).filter((i) => !this.moved.has(i));
    const x0 = rect.x - margin;
    const y0 = rect.y - margin;
    const x1 = right(rect) + margin;
    const y1 = bottom(rect) + margin;
    for (const [i, r] of this.moved)
      if (r.x <= x1 && right(r) >= x0 && r.y <= y1 && bottom(r) >= y0) hits.push(i);
    return hits;
  }
}

/**
 * The index after the rectangles at some positions changed (an edit of a few blocks): the R-tree is
 * kept and the changed rectangles are searched beside it, so an edit on a whole die updates the index
 * instead of building it again. Null once too many rectangles have moved: then build a new one.
 */
export function withMovedRects(index: SpatialIndex, changed: ReadonlyMap<number, Rect>): SpatialIndex | null {
  const base = index instanceof MovedIndex ? index.base : index;
  const moved = new Map(index instanceof MovedIndex ? index.moved : []);
  for (const [i, r] of changed) moved.set(i, r);
  return moved.size > MOST_MOVED ? null : new MovedIndex(base, moved);
}
