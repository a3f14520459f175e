import type { Step } from './cellPitch';
import { bottom, right, type Rect } from './rect';

/**
 * Snapping for moves and drawing: whole-pitch steps, and edges that line up with (or abut) the edges of
 * other blocks. Everything is in metres; the caller turns its pixel threshold into metres.
 */

/** Sorted edge coordinates of the blocks that can be snapped to: left, right and centre x; top, bottom and centre y. */
export interface SnapTargets {
  readonly xs: Float64Array;
  readonly ys: Float64Array;
}

export function buildSnapTargets(rects: Iterable<Rect>): SnapTargets {
  const xs: number[] = [];
  const ys: number[] = [];
  for (const r of rects) {
    xs.push(r.x, right(r), r.x + r.width / 2);
    ys.push(r.y, bottom(r), r.y + r.height / 2);
  }
  return { xs: Float64Array.from(xs).sort(), ys: Float64Array.from(ys).sort() };
}

/** The target nearest to `value` within `threshold`, or null (binary search, O(log n)). */
export function nearestTarget(targets: Float64Array, value: number, threshold: number): number | null {
  let low = 0;
  let high = targets.length;
  while (low < high) {
    const mid = (low + high) >>> 1;
    if ((targets[mid] ?? Infinity) < value) low = mid + 1;
    else high = mid;
  }
  let best: number | null = null;
  for (const i of [low - 1, low]) {
    const t = targets[i];
    if (t === undefined) continue;
    const d = Math.abs(t - value);
    if (d <= threshold && (best === null || d < Math.abs(best - value))) best = t;
  }
  return best;
}

/** Where a snapped edge lines up: the coordinate of a guide line across the canvas, or null. */
export interface SnapResult {
  readonly dx: number;
  readonly dy: number;
  readonly guideX: number | null;
  readonly guideY: number | null;
}

/** Rounds a displacement to whole pitches; a pitch of 0 leaves it as it is. */
export function snapToPitch(delta: number, pitch: number): number {
  return pitch > 0 ? Math.round(delta / pitch) * pitch : delta;
}

/**
 * Snaps one axis: the moved edges (start, end, centre) are tried against the targets, and the nearest
 * match within the threshold wins (start and end before centre on a tie, so abutment beats centring);
 * without a match the displacement is rounded to whole pitches.
 */
function snapAxis(
  start: number,
  length: number,
  rawDelta: number,
  pitch: number,
  targets: Float64Array,
  threshold: number,
): { delta: number; guide: number | null } {
  const edges = [start, start + length, start + length / 2];
  let best: { delta: number; guide: number; distance: number } | null = null;
  for (const edge of edges) {
    const moved = edge + rawDelta;
    const target = nearestTarget(targets, moved, threshold);
    if (target === null) continue;
    const distance = Math.abs(target - moved);
    // Differences under a picometre are rounding, not a real preference: the earlier edge keeps the tie.
    if (best === null || distance < best.distance - 1e-12) {
      best = { delta: target - edge, guide: target, distance };
    }
  }
  if (best) return { delta: best.delta, guide: best.guide };
  return { delta: snapToPitch(rawDelta, pitch), guide: null };
}

/**
 * Snaps the move of `rect` by (rawDx, rawDy): edges within `threshold` of another block's edge line up
 * with it (and show a guide), otherwise the move goes in whole pitches.
 */
export function snapMove(
  rect: Rect,
  rawDx: number,
  rawDy: number,
  pitch: Step,
  targets: SnapTargets,
  threshold: number,
): SnapResult {
  const x = snapAxis(rect.x, rect.width, rawDx, pitch.x, targets.xs, threshold);
  const y = snapAxis(rect.y, rect.height, rawDy, pitch.y, targets.ys, threshold);
  return { dx: x.delta, dy: y.delta, guideX: x.guide, guideY: y.guide };
}

/** Snaps a point to the nearest edge within the threshold on each axis, else to the pitch grid from 0. */
export function snapPoint(
  point: { x: number; y: number },
  pitch: Step,
  targets: SnapTargets,
  threshold: number,
): { x: number; y: number; guideX: number | null; guideY: number | null } {
  const tx = nearestTarget(targets.xs, point.x, threshold);
  const ty = nearestTarget(targets.ys, point.y, threshold);
  return {
    x: tx ?? snapToPitch(point.x, pitch.x),
    y: ty ?? snapToPitch(point.y, pitch.y),
    guideX: tx,
    guideY: ty,
  };
}
