import type { Rect } from '../../geometry/rect';

/**
 * Level of detail for blocks too small to outline: neighbours closer than `gapPx` on screen merge into
 * one rectangle, so a whole-die view paints a few hundred runs instead of tens of thousands of
 * rectangles that would overlap on the same pixels anyway. First rectangles of one row (same top and
 * height) merge along x; then runs of one column (same left and width) merge along y. A rectangle
 * that merges with nothing is returned as it is. Pure: rectangles in, rectangles out (same units as in;
 * `scale` turns them into pixels).
 */
export function aggregateRuns(rects: readonly Rect[], scale: number, gapPx: number): Rect[] {
  if (rects.length < 2) return rects.slice();
  const gap = gapPx / scale;
  const rows = mergeAlong(rects, gap, 'x');
  return rows.length < 2 ? rows : mergeAlong(rows, gap, 'y');
}

/** Merges rectangles that share their cross-axis extent and lie within `gap` of each other along `axis`. */
function mergeAlong(rects: readonly Rect[], gap: number, axis: 'x' | 'y'): Rect[] {
  const across = axis === 'x' ? 'y' : 'x';
  const acrossSize = axis === 'x' ? 'height' : 'width';
  const size = axis === 'x' ? 'width' : 'height';
  const order = rects.map((_, i) => i);
  const compare = (a: number, b: number) => {
    const ra = rects[a] as Rect;
    const rb = rects[b] as Rect;
    return ra[across] - rb[across] || ra[acrossSize] - rb[acrossSize] || ra[axis] - rb[axis];
  };
  // A tiled floorplan lists its blocks row by row, so the rows pass usually finds them in order already:
  // one look along the list then saves a comparison sort of every block.
  let sorted = true;
  for (let i = 1; i < order.length && sorted; i++) sorted = compare(i - 1, i) <= 0;
  if (!sorted) order.sort(compare);
  const out: Rect[] = [];
  let run: { x: number; y: number; width: number; height: number } | null = null;
  for (const i of order) {
    const r = rects[i] as Rect;
    if (
      run &&
      run[across] === r[across] &&
      run[acrossSize] === r[acrossSize] &&
      r[axis] <= run[axis] + run[size] + gap
    ) {
      run[size] = Math.max(run[axis] + run[size], r[axis] + r[size]) - run[axis];
      continue;
    }
    if (run) out.push(run);
    run = { x: r.x, y: r.y, width: r.width, height: r.height };
  }
  if (run) out.push(run);
  return out;
}
