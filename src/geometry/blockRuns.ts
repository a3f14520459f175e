import { wordsOf } from './doubleWords';
import type { Boxes } from './blockTable';

/**
 * A table's blocks cut into runs: a run is a stretch of blocks that follow each other in design order,
 * carry the same code (a block type, say), share their top edge and height exactly (the same bits), and
 * stand side by side from left to right: each starts at or right of where the one before it starts, and
 * reaches back over the blocks before it by no more than the margin (rounding can make abutting tiles
 * overlap by a few ulps), so no two blocks of a run share more than the margin across. Tiled arrays are
 * written row by row, so a 64 × 64 grid of mats with its strips is about 200 runs of 12,418 blocks: a
 * whole-die pass can work per run, and per pair of runs, instead of per block or per pair of blocks.
 *
 * Run r holds blocks `start[r]` … `start[r + 1] − 1`; all of them span `top[r]` … `bottom[r]` vertically
 * (bottom = y + height, computed as every box test computes it). Within a run, design order is left to
 * right order. Runs of one `layout` have the same length and, at each place, the same left edge and
 * width to the bit (the rows of a tiled array, written with the same column positions): whatever a pass
 * works out from those alone holds for all of them.
 */
export class BlockRuns {
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
    /** Each run's layout (0 … layouts − 1; see above). */
    readonly layout: Int32Array,
    readonly layouts: number,
  ) {}
}

/**
 * The runs of a table, with each block's code: blocks of different codes never share a run. `margin`
 * (m, ≥ 0) decides which runs count as touching. Returns null when some box is not finite or has a
 * negative width or height, or when the blocks do not form long runs (more than `maxRuns` of them), so that a
 * caller can take its general path having paid for one pass only.
 *
 * Method, cheap before V8 compiles anything (the first evaluation in a page runs in the interpreter, where
 * every double read from an array or computed is a new heap object, and an int32 is not): blocks are first
 * cut into bands of one code, top edge and height, comparing the coordinates' bit patterns as 32-bit words;
 * bands whose left edges and widths have the same bits as an earlier band's take that band's layout; only
 * the first band of each layout is cut into runs by its coordinates, and every later one copies its cuts.
 */
export function blockRuns(boxes: Boxes, code: Uint8Array, margin: number, maxRuns: number): BlockRuns | null {
  const n = boxes.count;
  const cap = Math.min(n, maxRuns);
  // Stretches the writer noted are bands too, each of one width besides (see Boxes.stretches).
  const noted = boxes.stretches;
  const bandStart = noted ?? new Int32Array(cap + 1);
  const bands = noted
    ? noted.length - 1
    : cutBands(wordsOf(boxes.y), wordsOf(boxes.height), code, bandStart, n, cap);
  if (bands < 0 || bands > cap) return null;
  if (!noted) bandStart[bands] = n;
  const bandLayout = new Int32Array(bands);
  classifyBands(
    wordsOf(boxes.x),
    wordsOf(boxes.width),
    bandStart,
    bands,
    bandLayout,
    noted !== null && noted !== undefined,
  );
  const runs = new RunCuts(cap, bands);
  for (let b = 0; b < bands; b++) {
    const layout = bandLayout[b] as number;
    runs.firstRun[b] = runs.count;
    const cut =
      layout === b ? cutLayout(boxes, margin, bandStart, b, runs) : copyCuts(bandStart, b, layout, runs);
    if (!cut || !describeBand(boxes, code, bandStart, b, runs)) return null;
  }
  const count = runs.count;
  runs.start[count] = n;
  return new BlockRuns(
    count,
    runs.start.subarray(0, count + 1),
    runs.top.subarray(0, count),
    runs.bottom.subarray(0, count),
    runs.code.subarray(0, count),
    runs.touching.subarray(0, count),
    runs.layout.subarray(0, count),
    runs.layouts,
  );
}

/**
 * Writes where each band starts into `starts` (a band: consecutive blocks of one code whose top edges
 * and heights have the same bits) and returns their number, or −1 past `cap`. Words, not doubles: an
 * int32 read in the interpreter allocates nothing.
 */
function cutBands(
  yWords: Int32Array,
  heightWords: Int32Array,
  code: Uint8Array,
  starts: Int32Array,
  n: number,
  cap: number,
): number {
  let count = 0;
  let y0 = 0;
  let y1 = 0;
  let h0 = 0;
  let h1 = 0;
  // Codes are ≥ 0: the first block starts a band.
  let bandCode = -1;
  for (let i = 0, w = 0; i < n; i++, w += 2) {
    if (
      code[i] !== bandCode ||
      yWords[w] !== y0 ||
      yWords[w + 1] !== y1 ||
      heightWords[w] !== h0 ||
      heightWords[w + 1] !== h1
    ) {
      if (count === cap) return -1;
      starts[count++] = i;
      bandCode = code[i] as number;
      y0 = yWords[w] as number;
      y1 = yWords[w + 1] as number;
      h0 = heightWords[w] as number;
      h1 = heightWords[w + 1] as number;
    }
  }
  return count;
}

/** Earlier layouts a band is compared with (the most recent first): rows of a few kinds alternate. */
const RECENT_LAYOUTS = 4;

/**
 * For each band, the first band with the same length, left edges and widths (bit for bit) among the
 * last few layouts seen, or the band itself when it starts a layout. When each band has one width
 * (`oneWidth`), the widths of two bands are compared once.
 */
function classifyBands(
  xWords: Int32Array,
  widthWords: Int32Array,
  bandStart: Int32Array,
  bands: number,
  bandLayout: Int32Array,
  oneWidth: boolean,
): void {
  const recent = new Int32Array(RECENT_LAYOUTS).fill(-1);
  for (let b = 0; b < bands; b++) {
    const from = bandStart[b] as number;
    const length = (bandStart[b + 1] as number) - from;
    let layout = b;
    for (let k = 0; k < RECENT_LAYOUTS; k++) {
      const r = recent[k] as number;
      if (r < 0) break;
      const rFrom = bandStart[r] as number;
      if (
        (bandStart[r + 1] as number) - rFrom === length &&
        sameWords(widthWords, 2 * rFrom, 2 * from, oneWidth ? 2 : 2 * length) &&
        sameWords(xWords, 2 * rFrom, 2 * from, 2 * length)
      ) {
        layout = r;
        break;
      }
    }
    bandLayout[b] = layout;
    if (layout === b) {
      recent.copyWithin(1, 0, RECENT_LAYOUTS - 1);
      recent[0] = b;
    }
  }
}

/**
 * Whether words a … a + length − 1 equal words b … b + length − 1 (length even: the words of doubles, two
 * compared per step, which saves the interpreter half of the loop's own bytecodes).
 */
function sameWords(words: Int32Array, a: number, b: number, length: number): boolean {
  const end = a + length;
  for (let p = a, q = b; p < end; p += 2, q += 2)
    if (words[p] !== words[q] || words[p + 1] !== words[q + 1]) return false;
  return true;
}

/** Runs as they are cut, band by band, in arrays of the most runs allowed. */
class RunCuts {
  count = 0;
  layouts = 0;
  readonly start: Int32Array;
  readonly top: Float64Array;
  readonly bottom: Float64Array;
  readonly code: Uint8Array;
  readonly touching: Uint8Array;
  readonly layout: Int32Array;
  /** Each band's first run; band b's runs end where band b + 1's begin. */
  readonly firstRun: Int32Array;

  constructor(
    readonly cap: number,
    bands: number,
  ) {
    this.start = new Int32Array(cap + 1);
    this.top = new Float64Array(cap);
    this.bottom = new Float64Array(cap);
    this.code = new Uint8Array(cap);
    this.touching = new Uint8Array(cap);
    this.layout = new Int32Array(cap);
    this.firstRun = new Int32Array(bands + 1);
  }
}

/**
 * Cuts band b (the first of its layout) into runs by its coordinates, each run a layout of its own; false
 * past the cap or when some right edge lies left of its box's left edge (a negative width, or NaN). A
 * block starts a new run where it starts left of the block before it or reaches back over the run by
 * more than the margin.
 */
function cutLayout(boxes: Boxes, margin: number, bandStart: Int32Array, b: number, runs: RunCuts): boolean {
  const { x, width } = boxes;
  const { start, touching, layout } = runs;
  const from = bandStart[b] as number;
  const to = bandStart[b + 1] as number;
  let count = runs.count;
  let lastX = 0;
  // The furthest right edge of the run so far.
  let lastRight = 0;
  for (let i = from; i < to; i++) {
    const xi = x[i] as number;
    const right = xi + (width[i] as number);
    if (!(right >= xi)) return false;
    if (i === from || !(xi >= lastX) || lastRight - xi > margin) {
      if (count === runs.cap) return false;
      start[count] = i;
      layout[count] = runs.layouts++;
      count++;
      runs.count = count;
      lastRight = right;
    } else {
      if (!(xi > lastRight + margin && xi - margin > lastRight)) touching[count - 1] = 1;
      if (right > lastRight) lastRight = right;
    }
    lastX = xi;
  }
  return true;
}

/** Band b's runs as those of band `first` (same layout: the same cuts, shifted); false past the cap. */
function copyCuts(bandStart: Int32Array, b: number, first: number, runs: RunCuts): boolean {
  const { start, touching, layout, firstRun } = runs;
  const shift = (bandStart[b] as number) - (bandStart[first] as number);
  const from = firstRun[first] as number;
  const to = firstRun[first + 1] as number;
  if (runs.count + to - from > runs.cap) return false;
  let count = runs.count;
  for (let r = from; r < to; r++) {
    start[count] = (start[r] as number) + shift;
    touching[count] = touching[r] as number;
    layout[count] = layout[r] as number;
    count++;
  }
  runs.count = count;
  return true;
}

/**
 * The vertical extent and code of band b's runs; false when some coordinate is
 * not finite or the bottom lies above the top. Within a run left edges never decrease and every right
 * edge lies at or right of its left edge, and a right edge of +∞ would have ended the run (the next block
 * reaching back over it by more than the margin): so when the first left edge, the last right edge and
 * the bottom are finite, so is every coordinate of the run. (Runs copied from a band of the same layout
 * have the same left edges and widths: checking the first band's runs was enough, but it costs little.)
 */
function describeBand(
  boxes: Boxes,
  code: Uint8Array,
  bandStart: Int32Array,
  b: number,
  runs: RunCuts,
): boolean {
  const { x, y, width, height } = boxes;
  const bandFrom = bandStart[b] as number;
  const bandTo = bandStart[b + 1] as number;
  const top = y[bandFrom] as number;
  const bottom = top + (height[bandFrom] as number);
  // A bottom above the top (negative height) takes the general path too: the grid bins such a box
  // into no cell, and its answer is the one to give.
  if (!Number.isFinite(bottom) || !(bottom >= top)) return false;
  const bandCode = code[bandFrom] as number;
  for (let r = runs.firstRun[b] as number; r < runs.count; r++) {
    const i = runs.start[r] as number;
    const last = (r + 1 < runs.count ? (runs.start[r + 1] as number) : bandTo) - 1;
    if (!Number.isFinite((x[i] as number) + ((x[last] as number) + (width[last] as number)))) return false;
    runs.top[r] = top;
    runs.bottom[r] = bottom;
    runs.code[r] = bandCode;
  }
  return true;
}
