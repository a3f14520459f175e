import { boundingBox, type Rect } from './rect';

/**
 * Rigid moves of a group of rectangles about the centre of their bounding box (m, y down): a quarter
 * turn clockwise, and mirroring left–right or top–bottom. Each rectangle keeps its own size under a
 * mirror and swaps width and height under a turn.
 */

export type MirrorAxis = 'leftRight' | 'topBottom';

/** Centre of the bounding box of the rectangles, or null for none. */
export function groupCentre(rects: Iterable<Rect>): { x: number; y: number } | null {
  const box = boundingBox(rects);
  return box ? { x: box.x + box.width / 2, y: box.y + box.height / 2 } : null;
}

/**
 * The rectangle turned a quarter clockwise about (cx, cy) as seen on screen (y grows downwards): a point
 * right of the centre goes below it, so (dx, dy) → (−dy, dx).
 */
export function rotateQuarterClockwise(rect: Rect, cx: number, cy: number): Rect {
  const dx = rect.x + rect.width / 2 - cx;
  const dy = rect.y + rect.height / 2 - cy;
  const centreX = cx - dy;
  const centreY = cy + dx;
  return {
    x: centreX - rect.height / 2,
    y: centreY - rect.width / 2,
    width: rect.height,
    height: rect.width,
  };
}

/** The rectangle mirrored about the vertical (leftRight) or horizontal (topBottom) line through the centre. */
export function mirrorRect(rect: Rect, axis: MirrorAxis, cx: number, cy: number): Rect {
  return axis === 'leftRight'
    ? { ...rect, x: 2 * cx - rect.x - rect.width }
    : { ...rect, y: 2 * cy - rect.y - rect.height };
}
