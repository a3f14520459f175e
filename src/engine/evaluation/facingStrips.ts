import { ABUTMENT_TOLERANCE } from '../../geometry/rect';

/*
 * The search behind the back-to-back check (backToBackStrips.ts): among strips of one type and
 * orientation, those whose far long edge meets another's near long edge.
 */

/** Pairs of table positions, two Int32 per pair, grown by doubling. */
export class PairList {
  private data = new Int32Array(64);
  length = 0;

  push(a: number, b: number): void {
    if (2 * this.length + 2 > this.data.length) {
      const grown = new Int32Array(2 * this.data.length);
      grown.set(this.data);
      this.data = grown;
    }
    this.data[2 * this.length] = a;
    this.data[2 * this.length + 1] = b;
    this.length++;
  }

  /** The pairs as [first, second, …]. */
  toArray(): Int32Array {
    return this.data.slice(0, 2 * this.length);
  }
}

/**
 * Pairs among `strips` (ascending positions) where one's far edge (start + size across) meets the other's
 * near edge and they overlap along the strip by more than the tolerance, in the order: each strip in turn,
 * its partners by start across, then by position.
 *
 * The strips are bucketed by their distinct start values (a native numeric sort of the starts, then a
 * counting sort of the strips), so there is no comparison callback and no object per strip. A strip whose
 * start is not a number meets nothing and is left out.
 */
export function facingPairs(
  strips: Int32Array,
  across: Float64Array,
  thickness: Float64Array,
  along: Float64Array,
  length: Float64Array,
  pairs: PairList,
): void {
  if (strips.length < 2 || !mayFace(strips, across, thickness)) return;
  const starts = new Float64Array(strips.length);
  for (let s = 0; s < strips.length; s++) starts[s] = across[strips[s] as number] as number;
  const distinct = distinctSorted(starts);
  // Counting sort of the strips by the rank of their start; ranks ascend with position, so ties keep it.
  const rank = new Int32Array(strips.length);
  const bucket = new Int32Array(distinct.length + 1);
  let r = 0;
  for (let s = 0; s < strips.length; s++) {
    const start = starts[s] as number;
    // Strips of a tiled array come in rows whose starts repeat or step to the next value: try there first.
    r = start === start ? lowerBoundFrom(distinct, start, r) : -1;
    rank[s] = r;
    if (r >= 0) (bucket[r + 1] as number)++;
  }
  for (let r = 0; r < distinct.length; r++) bucket[r + 1] = (bucket[r + 1] as number) + (bucket[r] as number);
  const fill = bucket.slice(0, distinct.length);
  const byStart = new Int32Array(bucket[distinct.length] as number);
  for (let s = 0; s < strips.length; s++) {
    const r = rank[s] as number;
    if (r >= 0) byStart[(fill[r] as number)++] = strips[s] as number;
  }
  let first = 0;
  for (let s = 0; s < strips.length; s++) {
    const i = strips[s] as number;
    const edge = (across[i] as number) + (thickness[i] as number);
    const alongStart = along[i] as number;
    const alongEnd = alongStart + (length[i] as number);
    first = lowerBoundFrom(distinct, edge - ABUTMENT_TOLERANCE, first);
    for (let r = first; r < distinct.length; r++) {
      if (!((distinct[r] as number) <= edge + ABUTMENT_TOLERANCE)) break;
      for (let q = bucket[r] as number; q < (bucket[r + 1] as number); q++) {
        const j = byStart[q] as number;
        if (j === i) continue;
        const overlap =
          Math.min(alongEnd, (along[j] as number) + (length[j] as number)) -
          Math.max(alongStart, along[j] as number);
        if (overlap > ABUTMENT_TOLERANCE) pairs.push(i, j);
      }
    }
  }
}

/**
 * False when no strip's far edge lies within the tolerance of any strip's start, so that no two strips
 * can face each other (the usual answer: a tiled array shares its strips). A strip with the same start
 * and thickness as the one before it, or as the one a period before it, adds nothing: a row of lying
 * strips counts once, and so do the rows after the first of standing strips (whose starts repeat with
 * the row's length, the period). The distinct starts and edges are then sorted natively and merged. True
 * when some edge has a start near it: the caller searches strip by strip.
 */
function mayFace(strips: Int32Array, across: Float64Array, thickness: Float64Array): boolean {
  const starts = new Float64Array(strips.length);
  const edges = new Float64Array(strips.length);
  const period = repeatAfter(strips, across, thickness);
  let runs = 0;
  let lastStart = NaN;
  let lastThickness = NaN;
  for (let s = 0; s < strips.length; s++) {
    const i = strips[s] as number;
    const start = across[i] as number;
    const size = thickness[i] as number;
    if (start === lastStart && size === lastThickness) continue;
    lastStart = start;
    lastThickness = size;
    if (period > 0 && s >= period) {
      const before = strips[s - period] as number;
      if (start === across[before] && size === thickness[before]) continue;
    }
    starts[runs] = start;
    edges[runs] = start + size;
    runs++;
  }
  return someEdgeNearAStart(starts.subarray(0, runs), edges.subarray(0, runs));
}

/** Past this many strips, {@link repeatAfter} stops looking for the first strip's start again. */
const LONGEST_PERIOD = 4096;

/**
 * Where the strips' starts and thicknesses begin to repeat: the first strip after the first change
 * with the first strip's start and thickness (0 when none within {@link LONGEST_PERIOD}).
 */
function repeatAfter(strips: Int32Array, across: Float64Array, thickness: Float64Array): number {
  const first = strips[0] as number;
  const start = across[first] as number;
  const size = thickness[first] as number;
  let s = 1;
  while (
    s < strips.length &&
    across[strips[s] as number] === start &&
    thickness[strips[s] as number] === size
  )
    s++;
  const last = Math.min(strips.length, s + LONGEST_PERIOD);
  for (; s < last; s++) {
    const i = strips[s] as number;
    if (across[i] === start && thickness[i] === size) return s;
  }
  return 0;
}

/**
 * True when some far edge (start + thickness, as the search adds them) lies within the tolerance of
 * some start, as the search compares them; sorts both arrays in place (natively) and merges them.
 */
export function someEdgeNearAStart(starts: Float64Array, edges: Float64Array): boolean {
  const n = starts.length;
  const sortedStarts = starts.sort();
  const sortedEdges = edges.sort();
  // NaN sorts last and meets nothing: the walk stops at the first NaN of either list.
  let first = 0;
  for (let e = 0; e < n; e++) {
    const edge = sortedEdges[e] as number;
    if (edge !== edge) return false;
    const from = edge - ABUTMENT_TOLERANCE;
    while (first < n && (sortedStarts[first] as number) < from) first++;
    if (first === n) return false;
    if ((sortedStarts[first] as number) <= edge + ABUTMENT_TOLERANCE) return true;
  }
  return false;
}

/** The distinct numbers among `values` (NaN left out), ascending. */
function distinctSorted(values: Float64Array): Float64Array {
  const sorted = values.slice().sort();
  let n = 0;
  for (let s = 0; s < sorted.length; s++) {
    const v = sorted[s] as number;
    if (v !== v) break; // NaN sorts last
    if (n === 0 || v !== sorted[n - 1]) sorted[n++] = v;
  }
  return sorted.subarray(0, n);
}

/**
 * {@link lowerBound}, checking `guess` and `guess + 1` before searching: the same answer, found without a
 * search when consecutive lookups land on the same or the next value.
 */
function lowerBoundFrom(values: Float64Array, value: number, guess: number): number {
  const n = values.length;
  for (let g = guess < 0 ? 0 : guess; g <= guess + 1 && g <= n; g++) {
    if ((g === 0 || (values[g - 1] as number) < value) && (g === n || !((values[g] as number) < value)))
      return g;
  }
  return lowerBound(values, value);
}

/** First index whose value is ≥ `value` in an ascending array. */
function lowerBound(values: Float64Array, value: number): number {
  let lo = 0;
  let hi = values.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if ((values[mid] as number) < value) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}
