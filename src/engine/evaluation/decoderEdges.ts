import type { BlockTable } from '../../geometry/blockTable';
import { ABUTMENT_TOLERANCE } from '../../geometry/rect';

/** Search window around an edge (m): twice the abutment tolerance, so rounding never drops a true match. */
const WINDOW = 2 * ABUTMENT_TOLERANCE;

/** One edge of every decoder, sorted by its coordinate (m), with the decoder's table position beside it. */
interface SortedEdges {
  readonly at: Float64Array;
  readonly decoder: Int32Array;
}

/**
 * The four edges of every decoder of one type, sorted, so that the decoders a block may abut are found by
 * binary search on the block's own edges: a block abuts a decoder only where one's edge lies on the
 * other's opposite edge. This replaces a scan of the whole table per decoder (O(n · decoders)) by one pass
 * of O(n log decoders). Decoders with an edge that is not a finite number are always candidates; the
 * caller's exact abutment test decides, as before.
 */
export class DecoderEdges {
  /** Where {@link near} writes the candidates; may hold one decoder several times. */
  readonly candidates: Int32Array;
  /**
   * The decoders' common bounding box grown by {@link WINDOW} (m: left, top, right, bottom), or null when
   * some decoder's edges are not finite. A block that abuts a decoder lies within the abutment tolerance
   * of it, so a block wholly outside this box abuts none (reachSeeds.ts tests blocks against it).
   */
  readonly reach: Float64Array | null;
  /** The top, bottom, left and right edges sorted, on the first {@link near} (a whole evaluation of a
   * die with a few decoders never asks). */
  private sorted: readonly [SortedEdges, SortedEdges, SortedEdges, SortedEdges] | null = null;

  private constructor(
    readonly decoders: Int32Array,
    /** The decoders whose edges are all finite numbers. */
    private readonly finite: readonly number[],
    private readonly unsorted: Int32Array,
    table: BlockTable,
  ) {
    this.candidates = new Int32Array(4 * decoders.length + unsorted.length);
    this.reach = unsorted.length > 0 ? null : grownBounds(table, finite);
  }

  /**
   * The edges of the decoders of type `decoderCode`, or null when there are none.
   */
  static of(table: BlockTable, decoderCode: number): DecoderEdges | null {
    const found: number[] = [];
    // Decoders are few: the native search finds them without a step of the interpreter per block.
    const { type } = table;
    for (let i = type.indexOf(decoderCode); i >= 0; i = type.indexOf(decoderCode, i + 1)) found.push(i);
    if (found.length === 0) return null;
    const finite: number[] = [];
    const unsorted: number[] = [];
    for (const d of found) {
      const right = (table.x[d] as number) + (table.width[d] as number);
      const bottom = (table.y[d] as number) + (table.height[d] as number);
      const ok = Number.isFinite(table.x[d]) && Number.isFinite(table.y[d]);
      (ok && Number.isFinite(right) && Number.isFinite(bottom) ? finite : unsorted).push(d);
    }
    return new DecoderEdges(Int32Array.from(found), finite, Int32Array.from(unsorted), table);
  }

  /**
   * Writes to {@link candidates} every decoder that may abut block `i` (a superset of those that do) and
   * returns how many it wrote.
   */
  near(table: BlockTable, i: number): number {
    const left = table.x[i] as number;
    const top = table.y[i] as number;
    const right = left + (table.width[i] as number);
    const bottom = top + (table.height[i] as number);
    const out = this.candidates;
    if (!(
      Number.isFinite(left) &&
      Number.isFinite(top) &&
      Number.isFinite(right) &&
      Number.isFinite(bottom)
    )) {
      out.set(this.decoders);
      return this.decoders.length;
    }
    const [topEdges, bottomEdges, leftEdges, rightEdges] = (this.sorted ??= sortedFour(table, this.finite));
    let n = 0;
    n = within(bottomEdges, top, out, n);
    n = within(topEdges, bottom, out, n);
    n = within(rightEdges, left, out, n);
    n = within(leftEdges, right, out, n);
    out.set(this.unsorted, n);
    return n + this.unsorted.length;
  }
}

/**
 * The box from the least top and left edges to the greatest bottom and right edges of the decoders (all
 * finite), grown by WINDOW; null when there are none.
 */
function grownBounds(table: BlockTable, decoders: readonly number[]): Float64Array | null {
  if (decoders.length === 0) return null;
  let left = Infinity;
  let top = Infinity;
  let right = -Infinity;
  let bottom = -Infinity;
  for (const d of decoders) {
    left = Math.min(left, table.x[d] as number);
    top = Math.min(top, table.y[d] as number);
    right = Math.max(right, (table.x[d] as number) + (table.width[d] as number));
    bottom = Math.max(bottom, (table.y[d] as number) + (table.height[d] as number));
  }
  return Float64Array.of(left - WINDOW, top - WINDOW, right + WINDOW, bottom + WINDOW);
}

/** The top, bottom, left and right edges of the decoders, each sorted. */
function sortedFour(
  table: BlockTable,
  finite: readonly number[],
): readonly [SortedEdges, SortedEdges, SortedEdges, SortedEdges] {
  const { x, y, width, height } = table;
  return [
    sortedEdges(finite, (d) => y[d] as number),
    sortedEdges(finite, (d) => (y[d] as number) + (height[d] as number)),
    sortedEdges(finite, (d) => x[d] as number),
    sortedEdges(finite, (d) => (x[d] as number) + (width[d] as number)),
  ];
}

function sortedEdges(decoders: readonly number[], edge: (d: number) => number): SortedEdges {
  const order = decoders.slice().sort((a, b) => edge(a) - edge(b) || a - b);
  return { at: Float64Array.from(order, edge), decoder: Int32Array.from(order) };
}

/** Appends to `out` from `n` the decoders whose edge lies within {@link WINDOW} of `value`. */
function within(edges: SortedEdges, value: number, out: Int32Array, n: number): number {
  const { at, decoder } = edges;
  // Most blocks lie away from every decoder: two comparisons decide that before any search.
  if (at.length === 0 || value < (at[0] as number) - WINDOW || value > (at[at.length - 1] as number) + WINDOW)
    return n;
  let lo = 0;
  let hi = at.length;
  const from = value - WINDOW;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if ((at[mid] as number) < from) lo = mid + 1;
    else hi = mid;
  }
  const to = value + WINDOW;
  for (; lo < at.length && (at[lo] as number) <= to; lo++) out[n++] = decoder[lo] as number;
  return n;
}
