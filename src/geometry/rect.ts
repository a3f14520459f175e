/** Axis-aligned rectangles on the floorplan, in metres, y growing downwards. */
export interface Rect {
  readonly x: number;
  readonly y: number;
  readonly width: number;
  readonly height: number;
}

/**
 * Two placed edges closer than this count as touching (m). One nanometre is far below any layout grid
 * and far above the rounding of sums of micrometre-sized floats.
 */
export const ABUTMENT_TOLERANCE = 1e-9;

export function right(rect: Rect): number {
  return rect.x + rect.width;
}

export function bottom(rect: Rect): number {
  return rect.y + rect.height;
}

export function area(rect: Rect): number {
  return rect.width * rect.height;
}

/** Area shared by two rectangles (m²); zero when they only touch. */
export function overlapArea(a: Rect, b: Rect): number {
  const w = Math.min(right(a), right(b)) - Math.max(a.x, b.x);
  const h = Math.min(bottom(a), bottom(b)) - Math.max(a.y, b.y);
  return w > ABUTMENT_TOLERANCE && h > ABUTMENT_TOLERANCE ? w * h : 0;
}

/** The extremes of some rectangles' edges (m); ±Infinity for none. */
export interface Bounds {
  readonly minX: number;
  readonly minY: number;
  readonly maxX: number;
  readonly maxY: number;
}

/** The extremes of the given rectangles' edges: left and top least, right and bottom greatest. */
export function boundsOf(rects: Iterable<Rect>): Bounds {
  let minX = Infinity;
  let minY = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  for (const r of rects) {
    minX = Math.min(minX, r.x);
    minY = Math.min(minY, r.y);
    maxX = Math.max(maxX, right(r));
    maxY = Math.max(maxY, bottom(r));
  }
  return { minX, minY, maxX, maxY };
}

/** The smallest rectangle holding all given rectangles, or null for none. */
export function boundingBox(rects: Iterable<Rect>): Rect | null {
  const { minX, minY, maxX, maxY } = boundsOf(rects);
  if (minX === Infinity) return null;
  return { x: minX, y: minY, width: maxX - minX, height: maxY - minY };
}

/** True when a point lies inside or on the border of a rectangle. */
export function containsPoint(rect: Rect, px: number, py: number): boolean {
  return px >= rect.x && px <= right(rect) && py >= rect.y && py <= bottom(rect);
}
