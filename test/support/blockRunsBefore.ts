import type { Boxes } from '../../src/geometry/blockTable';

// The oracle of geometry/blockRuns.ts: its block-by-block cut as it was before runs were cut per band
// layout (test/geometry/blockRunsLayout.test.ts compares the two).

/**
 * A table's blocks cut into runs: a run is a stretch of blocks that follow each other in design order,
 * carry the same code (a block type, say), share their top edge and height exactly (floating-point
 * equality), and stand side by side from left to right: each starts at or right of where the one before
 * it starts, and reaches back over the blocks before it by no more than the margin (rounding can make
 * abutting tiles overlap by a few ulps), so no two blocks of a run share more than the margin across. Tiled arrays are written row by row, so a 64 × 64 grid of mats with its
 * strips is about 200 runs of 12,418 blocks: a whole-die pass can work per run, and per pair of runs,
 * instead of per block or per pair of blocks.
 *
 * Run r holds blocks `start[r]` … `start[r + 1] − 1`; all of them span `top[r]` … `bottom[r]` vertically
 * (bottom = y + height, computed as every box test computes it). Within a run, design order is left to
 * right order.
 */
export class BlockRunsBefore {
  constructor(
    readonly count: number,
    readonly start: Int32Array,
    readonly top: Float64Array,
    readonly bottom: Float64Array,
    readonly code: Uint8Array,
    /**
     * 1 when two consecutive blocks of run r meet horizontally with the margin the runs were cut for
     * (either of the box test's comparisons holds), 0 when each block clears the next.
     */
    readonly touching: Uint8Array,
  ) {}
}

/**
 * The runs of a table, with each block's code: blocks of different codes never share a run. `margin`
 * (m, ≥ 0) decides which runs count as touching. Returns null when some box is not finite or has a
 * negative width or height, or when the blocks do not form long runs (more than `maxRuns` of them), so that a
 * caller can take its general path having paid for one pass only.
 */
export function blockRunsBefore(
  boxes: Boxes,
  code: Uint8Array,
  margin: number,
  maxRuns: number,
): BlockRunsBefore | null {
  const n = boxes.count;
  const cap = Math.min(n, maxRuns);
  const starts = new Int32Array(cap + 1);
  const touching = new Uint8Array(cap);
  const count = cutRuns(boxes, code, margin, starts, touching, cap);
  if (count < 0) return null;
  starts[count] = n;
  const top = new Float64Array(count);
  const bottom = new Float64Array(count);
  const codes = new Uint8Array(count);
  if (!describeRuns(boxes, code, starts, top, bottom, codes)) return null;
  return new BlockRunsBefore(
    count,
    starts.subarray(0, count + 1),
    top,
    bottom,
    codes,
    touching.subarray(0, count),
  );
}

/**
 * Writes where each run starts into `starts`, marks runs whose blocks touch, and returns the number of
 * runs, or −1 when there would be more than `cap` or a right edge lies left of its box's left edge
 * (a negative width, or NaN). One hot loop per function, with nothing after it: code after a loop that
 * V8 compiled while it ran has no type feedback and throws the compiled loop away (DEVELOPERS.md).
 */
function cutRuns(
  boxes: Boxes,
  code: Uint8Array,
  margin: number,
  starts: Int32Array,
  touching: Uint8Array,
  cap: number,
): number {
  const { x, y, width, height } = boxes;
  const n = boxes.count;
  let count = 0;
  let runY = NaN;
  let runHeight = NaN;
  let runCode = -1;
  let lastX = 0;
  // The furthest right edge of the run so far.
  let lastRight = 0;
  for (let i = 0; i < n; i++) {
    const xi = x[i] as number;
    const yi = y[i] as number;
    const hi = height[i] as number;
    const right = xi + (width[i] as number);
    if (!(right >= xi)) return -1;
    if (yi !== runY || hi !== runHeight || code[i] !== runCode || !(xi >= lastX) || lastRight - xi > margin) {
      if (count === cap) return -1;
      starts[count++] = i;
      runY = yi;
      runHeight = hi;
      runCode = code[i] as number;
      lastRight = right;
    } else {
      if (!(xi > lastRight + margin && xi - margin > lastRight)) touching[count - 1] = 1;
      if (right > lastRight) lastRight = right;
    }
    lastX = xi;
  }
  return count;
}

/**
 * Each run's vertical extent and code; false when some coordinate of the run is not finite. Within a run
 * left edges never decrease and every right edge lies at or right of its left edge, and a right edge of
 * +∞ would have ended the run (the next block reaching back over it by more than the margin): so when the
 * first left edge, the last right edge and the bottom are finite, so is every coordinate of the run.
 */
function describeRuns(
  boxes: Boxes,
  code: Uint8Array,
  starts: Int32Array,
  top: Float64Array,
  bottom: Float64Array,
  codes: Uint8Array,
): boolean {
  const { x, y, width, height } = boxes;
  for (let r = 0; r < top.length; r++) {
    const i = starts[r] as number;
    const last = (starts[r + 1] as number) - 1;
    const runBottom = (y[i] as number) + (height[i] as number);
    const runRight = (x[last] as number) + (width[last] as number);
    if (!Number.isFinite((x[i] as number) + runRight + runBottom)) return false;
    // A bottom above the top (negative height) takes the general path too: the grid bins such a box
    // into no cell, and its answer is the one to give.
    if (!(runBottom >= (y[i] as number))) return false;
    top[r] = y[i] as number;
    bottom[r] = runBottom;
    codes[r] = code[i] as number;
  }
  return true;
}
