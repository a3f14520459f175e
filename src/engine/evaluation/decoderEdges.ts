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

  private constructor(
    readonly decoders: Int32Array,
    private readonly top: SortedEdges,
    private readonly bottom: SortedEdges,
    private readonly left: SortedEdges,
    private readonly right: SortedEdges,
    private readonly unsorted: Int32Array,
  ) {
    this.candidates = new Int32Array(4 * decoders.length + unsorted.length);
    this.reach = unsorted.length > 0 ? null : grownBounds(top, bottom, left, right);
  }

  /** The edges of the decoders of type `decoderCode`, or null when there are none. */
  static of(table: BlockTable, decoderCode: number): DecoderEdges | null {
    // Decoders are few: the native search finds them without a step of the interpreter per block.
    const { type } = table;
    let count = 0;
    for (let i = type.indexOf(decoderCode); i >= 0; i = type.indexOf(decoderCode, i + 1)) count++;
    if (count === 0) return null;
    const decoders = new Int32Array(count);
    for (let i = type.indexOf(decoderCode), n = 0; i >= 0; i = type.indexOf(decoderCode, i + 1))
      decoders[n++] = i;
    const finite: number[] = [];
    const unsorted: number[] = [];
    for (const d of decoders) {
      const right = (table.x[d] as number) + (table.width[d] as number);
      const bottom = (table.y[d] as number) + (table.height[d] as number);
      const ok = Number.isFinite(table.x[d]) && Number.isFinite(table.y[d]);
      (ok && Number.isFinite(right) && Number.isFinite(bottom) ? finite : unsorted).push(d);
    }
    const { x, y, width, height } = table;
    return new DecoderEdges(
      decoders,
      sortedEdges(finite, (d) => y[d] as number),
      sortedEdges(finite, (d) => (y[d] as number) + (height[d] as number)),
      sortedEdges(finite, (d) => x[d] as number),
      sortedEdges(finite, (d) => (x[d] as number) + (width[d] as number)),
      Int32Array.from(unsorted),
    );
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
    let n = 0;
    n = within(this.bottom, top, out, n);
    n = within(this.top, bottom, out, n);
    n = within(this.right, left, out, n);
    n = within(this.left, right, out, n);
    out.set(this.unsorted, n);
    return n + this.unsorted.length;
  }
}

/** The box from the first top and left edges to the last bottom and right edges, grown by WINDOW. */
function grownBounds(
  top: SortedEdges,
  bottom: SortedEdges,
  left: SortedEdges,
  right: SortedEdges,
): Float64Array | null {
  const last = (edges: SortedEdges) => edges.at[edges.at.length - 1] as number;
  if (top.at.length === 0) return null;
  return Float64Array.of(
    (left.at[0] as number) - WINDOW,
    (top.at[0] as number) - WINDOW,
    last(right) + WINDOW,
    last(bottom) + WINDOW,
  );
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
