import type { Boxes } from './blockTable';

/**
 * Neighbours of every block in compressed rows: block i's neighbours are `list[start[i]]` up to
 * `list[end[i] − 1]`, in ascending order, never i itself. Rows may sit anywhere in `list`.
 */
export interface NeighbourTable {
  readonly start: Int32Array;
  readonly end: Int32Array;
  readonly list: Int32Array;
}

/** Block i's neighbours as a plain array (for tests and small callers; hot loops read the table). */
export function neighboursOf(table: NeighbourTable, i: number): number[] {
  return Array.from(table.list.subarray(table.start[i] ?? 0, table.end[i] ?? 0));
}

/**
 * A table with only some rows filled, the rest empty: for callers that need the neighbours of a few
 * blocks (a live preview finds them by R-tree queries). Rows are sorted here.
 */
export function neighbourTableOf(
  count: number,
  rows: ReadonlyMap<number, readonly number[]>,
): NeighbourTable {
  const start = new Int32Array(count);
  const end = new Int32Array(count);
  let total = 0;
  for (const row of rows.values()) total += row.length;
  const list = new Int32Array(total);
  let at = 0;
  for (const [i, row] of rows) {
    if (i < 0 || i >= count) continue;
    start[i] = at;
    for (const j of row) list[at++] = j;
    end[i] = at;
    sortRange(list, start[i] as number, at);
  }
  return { start, end, list };
}

/**
 * Every block's neighbours in one pass: for each rectangle, the indices of the others whose boxes meet
 * its box grown by `margin` (closed comparison, so blocks exactly `margin` apart still count), ascending.
 * The relation is symmetric: a pair counts when either box, grown, meets the other.
 *
 * Method: a uniform-grid broad phase ("spatial hashing"; Ericson, *Real-Time Collision Detection*, Morgan
 * Kaufmann 2005, §7.1). Boxes are binned into square cells about the size of a typical block, and only
 * boxes sharing a cell are compared. A pair sharing several cells is reported once, by the cell that holds
 * the lower corner of the two boxes' intersection. For floorplans of similar-sized blocks this is O(n +
 * pairs), with no tree and no per-query arrays, which is what a whole-die evaluation needs; arbitrary
 * point or box queries (hit-testing, live previews) use the R-tree in spatialIndex.ts instead.
 */
export function neighbourTable(boxes: Boxes, margin: number): NeighbourTable {
  const n = boxes.count;
  // Box edges (m): x0..x1 by y0..y1.
  const x0 = boxes.x;
  const y0 = boxes.y;
  const x1 = new Float64Array(n);
  const y1 = new Float64Array(n);
  let minX = Infinity;
  let minY = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  for (let i = 0; i < n; i++) {
    const ax = x0[i] as number;
    const ay = y0[i] as number;
    const bx = ax + (boxes.width[i] as number);
    const by = ay + (boxes.height[i] as number);
    x1[i] = bx;
    y1[i] = by;
    if (ax < minX) minX = ax;
    if (ay < minY) minY = ay;
    if (bx > maxX) maxX = bx;
    if (by > maxY) maxY = by;
  }
  const pairs = new PairBuffer(n);
  // The grid covers the boxes grown by the margin.
  minX -= margin;
  minY -= margin;
  const spanX = maxX + margin - minX;
  const spanY = maxY + margin - minY;
  if (n < 2) return pairs.table(n);
  if (!Number.isFinite(spanX) || !Number.isFinite(spanY)) {
    for (let i = 0; i < n; i++) {
      for (let j = i + 1; j < n; j++) {
        if (meets(i, j, margin, x0, y0, x1, y1) || meets(j, i, margin, x0, y0, x1, y1)) pairs.add(i, j);
      }
    }
    return pairs.table(n);
  }

  const { columns, rows, cellSize } = gridShape(x0, y0, x1, y1, spanX, spanY);
  const column = (v: number) => Math.min(columns - 1, Math.max(0, Math.floor((v - minX) / cellSize)));
  const row = (v: number) => Math.min(rows - 1, Math.max(0, Math.floor((v - minY) / cellSize)));

  // Cell range of every box, and how many boxes land in each cell (counting sort).
  const c0 = new Int32Array(n);
  const c1 = new Int32Array(n);
  const r0 = new Int32Array(n);
  const r1 = new Int32Array(n);
  const cellCount = columns * rows;
  const start = new Int32Array(cellCount + 1);
  for (let i = 0; i < n; i++) {
    const a = column((x0[i] as number) - margin);
    const b = column((x1[i] as number) + margin);
    const c = row((y0[i] as number) - margin);
    const d = row((y1[i] as number) + margin);
    c0[i] = a;
    c1[i] = b;
    r0[i] = c;
    r1[i] = d;
    for (let rr = c; rr <= d; rr++)
      for (let cc = a; cc <= b; cc++) (start[rr * columns + cc + 1] as number)++;
  }
  for (let k = 0; k < cellCount; k++) start[k + 1] = (start[k + 1] as number) + (start[k] as number);
  const members = new Int32Array(start[cellCount] as number);
  const fill = start.slice(0, cellCount);
  // Boxes go in ascending index order, so each cell's list is ascending.
  for (let i = 0; i < n; i++) {
    const a = c0[i] as number;
    const b = c1[i] as number;
    const d = r1[i] as number;
    for (let rr = r0[i] as number; rr <= d; rr++) {
      for (let cc = a; cc <= b; cc++) {
        const cell = rr * columns + cc;
        members[fill[cell] as number] = i;
        fill[cell] = (fill[cell] as number) + 1;
      }
    }
  }

  for (let cell = 0; cell < cellCount; cell++) {
    const from = start[cell] as number;
    const to = start[cell + 1] as number;
    if (to - from < 2) continue;
    const cc = cell % columns;
    const rr = (cell - cc) / columns;
    for (let p = from; p < to; p++) {
      const i = members[p] as number;
      const ci = c0[i] as number;
      const ri = r0[i] as number;
      for (let q = p + 1; q < to; q++) {
        const j = members[q] as number;
        // Report the pair only in the cell holding the lower corner of the grown boxes' intersection.
        if ((ci > (c0[j] as number) ? ci : (c0[j] as number)) !== cc) continue;
        if ((ri > (r0[j] as number) ? ri : (r0[j] as number)) !== rr) continue;
        // The box of i grown by the margin against the plain box of j, compared as a box query would be,
        // or the other way round: rounding can make the two differ by an ulp when the gap is the margin.
        if (meets(i, j, margin, x0, y0, x1, y1) || meets(j, i, margin, x0, y0, x1, y1)) pairs.add(i, j);
      }
    }
  }
  return pairs.table(n);
}

/** Pairs (i < j) collected in growable typed arrays, then turned into rows of both directions. */
class PairBuffer {
  private first: Int32Array;
  private second: Int32Array;
  private count = 0;

  constructor(expected: number) {
    this.first = new Int32Array(Math.max(16, 4 * expected));
    this.second = new Int32Array(this.first.length);
  }

  add(i: number, j: number): void {
    if (this.count === this.first.length) {
      const first = new Int32Array(this.count * 2);
      const second = new Int32Array(this.count * 2);
      first.set(this.first);
      second.set(this.second);
      this.first = first;
      this.second = second;
    }
    this.first[this.count] = i;
    this.second[this.count] = j;
    this.count++;
  }

  table(n: number): NeighbourTable {
    const bounds = new Int32Array(n + 1);
    for (let k = 0; k < this.count; k++) {
      (bounds[(this.first[k] as number) + 1] as number)++;
      (bounds[(this.second[k] as number) + 1] as number)++;
    }
    for (let i = 0; i < n; i++) bounds[i + 1] = (bounds[i + 1] as number) + (bounds[i] as number);
    const list = new Int32Array(bounds[n] as number);
    const next = bounds.slice(0, n);
    for (let k = 0; k < this.count; k++) {
      const i = this.first[k] as number;
      const j = this.second[k] as number;
      list[next[i] as number] = j;
      next[i] = (next[i] as number) + 1;
      list[next[j] as number] = i;
      next[j] = (next[j] as number) + 1;
    }
    for (let i = 0; i < n; i++) sortRange(list, bounds[i] as number, bounds[i + 1] as number);
    return { start: bounds.subarray(0, n), end: bounds.subarray(1), list };
  }
}

/** At most this many grid cells per box, so memory stays O(n) however the boxes are spread. */
const CELLS_PER_BOX = 4;
/** Boxes sampled to find the typical block size. */
const SIZE_SAMPLE = 1024;

/**
 * Cell size about the median box size (sampled), so a typical box spans one or two cells; enlarged when
 * the floorplan is so sparse that the grid would have more than {@link CELLS_PER_BOX} cells per box.
 */
function gridShape(
  x0: Float64Array,
  y0: Float64Array,
  x1: Float64Array,
  y1: Float64Array,
  spanX: number,
  spanY: number,
): { columns: number; rows: number; cellSize: number } {
  const n = x1.length;
  // Sizes of the plain boxes; the grid is laid over the grown ones.
  const step = Math.max(1, Math.floor(n / SIZE_SAMPLE));
  const sizes = new Float64Array(Math.ceil(n / step));
  for (let k = 0, i = 0; i < n; i += step, k++) {
    sizes[k] = Math.max((x1[i] as number) - (x0[i] as number), (y1[i] as number) - (y0[i] as number));
  }
  sizes.sort();
  let cellSize = sizes[sizes.length >> 1] as number;
  const largest = Math.max(spanX, spanY);
  if (!(cellSize > 0)) cellSize = largest > 0 ? largest : 1;
  const budget = CELLS_PER_BOX * n;
  let columns = Math.max(1, Math.ceil(spanX / cellSize));
  let rows = Math.max(1, Math.ceil(spanY / cellSize));
  if (columns * rows > budget) {
    cellSize *= Math.sqrt((columns * rows) / budget);
    columns = Math.max(1, Math.ceil(spanX / cellSize));
    rows = Math.max(1, Math.ceil(spanY / cellSize));
    // Rounding up can still overshoot for very long thin floorplans; one line of cells is then enough.
    while (columns * rows > budget) {
      cellSize *= 1.5;
      columns = Math.max(1, Math.ceil(spanX / cellSize));
      rows = Math.max(1, Math.ceil(spanY / cellSize));
    }
  }
  return { columns, rows, cellSize };
}

/** Insertion sort of list[from..to): rows hold a handful of entries. */
function sortRange(list: Int32Array, from: number, to: number): void {
  for (let k = from + 1; k < to; k++) {
    const v = list[k] as number;
    let m = k - 1;
    while (m >= from && (list[m] as number) > v) {
      list[m + 1] = list[m] as number;
      m--;
    }
    list[m + 1] = v;
  }
}

/** Whether the box of `i` grown by `margin` meets the box of `j` (closed), as an R-tree query computes it. */
function meets(
  i: number,
  j: number,
  margin: number,
  x0: Float64Array,
  y0: Float64Array,
  x1: Float64Array,
  y1: Float64Array,
): boolean {
  return (
    (x0[i] as number) - margin <= (x1[j] as number) &&
    (x0[j] as number) <= (x1[i] as number) + margin &&
    (y0[i] as number) - margin <= (y1[j] as number) &&
    (y0[j] as number) <= (y1[i] as number) + margin
  );
}
