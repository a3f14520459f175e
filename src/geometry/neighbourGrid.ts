import type { Boxes } from './blockTable';
import { PairBuffer, runningTotals, type NeighbourTable } from './neighbourRows';
import { bandedNeighbourTable } from './bandedPairs';
import { ScratchBuffer } from './scratchBuffer';

/** Whether a meeting pair of boxes belongs in the table. */
export type PairFilter = (i: number, j: number) => boolean;
const KEEP_ALL: PairFilter = () => true;

/**
 * Every block's neighbours in one pass: for each rectangle, the indices of the others whose boxes meet
 * its box grown by `margin` (closed comparison, so blocks exactly `margin` apart still count), ascending.
 * The relation is symmetric: a pair counts when either box, grown, meets the other.
 *
 * Method: a uniform-grid broad phase ("spatial hashing"; Ericson, *Real-Time Collision Detection*, Morgan
 * Kaufmann 2005, §7.1, section number from memory). Boxes are binned into square cells about the size of a typical block, and only
 * boxes sharing a cell are compared. A pair sharing several cells is reported once, by the cell that holds
 * the lower corner of the two boxes' intersection. For floorplans of similar-sized blocks this is O(n +
 * pairs), with no tree and no per-query arrays, which is what a whole-die evaluation needs; arbitrary
 * point or box queries (hit-testing, live previews) use the R-tree in spatialIndex.ts instead.
 */
export function neighbourTable(
  boxes: Boxes,
  margin: number,
  /** Which meeting pairs to keep (default: all); a caller that needs only some saves storing the rest. */
  keep: PairFilter = KEEP_ALL,
): NeighbourTable {
  const n = boxes.count;
  const pairs = new PairBuffer();
  if (n < 2) return pairs.table(n);
  // Each pass below is its own small function: V8 optimises a function with one hot loop reliably,
  // while one long function of several loops kept being deoptimised and ran several times slower.
  const bounds = extent(boxes, margin);
  if (!bounds) {
    allPairs(boxes, margin, keep, pairs);
    return pairs.table(n);
  }
  const grid = gridShape(boxes, bounds);
  const cells = binBoxes(boxes, margin, grid);
  gridPairs(boxes, margin, keep, grid, cells, pairs);
  return pairs.table(n);
}

/**
 * {@link neighbourTable} with the rule evaluation needs: boxes of different groups that meet (as there),
 * and boxes of one group only when they share more than `margin` in both directions (an overlap, not a
 * touch; such boxes always meet). Floorplans written in rows take the banded pass (bandedPairs.ts).
 */
export function groupedNeighbourTable(boxes: Boxes, margin: number, group: Uint8Array): NeighbourTable {
  return bandedNeighbourTable(boxes, margin, group, IDENTITY) ?? groupedGridTable(boxes, margin, group);
}

/** Groups as their own codes. */
const IDENTITY = Uint8Array.from({ length: 256 }, (_, k) => k);

/**
 * {@link groupedNeighbourTable} by the grid alone: the general path (floorplans not written in rows,
 * such as a small hand-drawn die) and the banded pass's oracle.
 */
export function groupedGridTable(boxes: Boxes, margin: number, group: Uint8Array): NeighbourTable {
  return neighbourTable(boxes, margin, (i, j) => group[i] !== group[j] || sharesBeyond(boxes, i, j, margin));
}

/**
 * True when boxes i and j share more than `margin` (m) in both directions: the overlap test of
 * engine/evaluation/overlaps.ts (overlapAreaAt > 0) with the same arithmetic.
 */
export function sharesBeyond(boxes: Boxes, i: number, j: number, margin: number): boolean {
  const { x, y, width, height } = boxes;
  const ax = x[i] as number;
  const ay = y[i] as number;
  const bx = x[j] as number;
  const by = y[j] as number;
  const w = Math.min(ax + (width[i] as number), bx + (width[j] as number)) - Math.max(ax, bx);
  const h = Math.min(ay + (height[i] as number), by + (height[j] as number)) - Math.max(ay, by);
  return w > margin && h > margin;
}

/** The grid's origin and size (m): the boxes grown by the margin. */
interface Extent {
  readonly minX: number;
  readonly minY: number;
  readonly spanX: number;
  readonly spanY: number;
}

/** The extent of the grown boxes, or null when some box is not finite. */
function extent(boxes: Boxes, margin: number): Extent | null {
  const { x, y, width, height } = boxes;
  let minX = Infinity;
  let minY = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  for (let i = 0; i < boxes.count; i++) {
    const ax = x[i] as number;
    const ay = y[i] as number;
    const bx = ax + (width[i] as number);
    const by = ay + (height[i] as number);
    if (ax < minX) minX = ax;
    if (ay < minY) minY = ay;
    if (bx > maxX) maxX = bx;
    if (by > maxY) maxY = by;
  }
  const spanX = maxX - minX + 2 * margin;
  const spanY = maxY - minY + 2 * margin;
  if (!Number.isFinite(spanX) || !Number.isFinite(spanY)) return null;
  return { minX: minX - margin, minY: minY - margin, spanX, spanY };
}

/** Every pair compared directly: only for boxes with non-finite extent, which restore never lets through. */
function allPairs(boxes: Boxes, margin: number, keep: PairFilter, pairs: PairBuffer): void {
  for (let i = 0; i < boxes.count; i++) {
    for (let j = i + 1; j < boxes.count; j++) {
      if ((meets(boxes, i, j, margin) || meets(boxes, j, i, margin)) && keep(i, j)) pairs.add(i, j);
    }
  }
}

interface Grid extends Extent {
  readonly columns: number;
  readonly rows: number;
  readonly cellSize: number;
}

/** Which cells each grown box covers (a column and row range), and the boxes of each cell. */
interface Binned {
  readonly firstColumn: Int32Array;
  readonly lastColumn: Int32Array;
  readonly firstRow: Int32Array;
  readonly lastRow: Int32Array;
  /** Cell c holds `members[start[c]]` … `members[start[c + 1] − 1]`, ascending. */
  readonly start: Int32Array;
  readonly members: Int32Array;
}

/**
 * The grid and its bins as class instances rather than object literals or spreads, so that they keep one
 * shape from call to call and the compiled passes reading them stay valid (see blockTable.ts, TableRows).
 */
class GridShape implements Grid {
  constructor(
    readonly minX: number,
    readonly minY: number,
    readonly spanX: number,
    readonly spanY: number,
    readonly columns: number,
    readonly rows: number,
    readonly cellSize: number,
  ) {}
}

class Bins implements Binned {
  constructor(
    readonly firstColumn: Int32Array,
    readonly lastColumn: Int32Array,
    readonly firstRow: Int32Array,
    readonly lastRow: Int32Array,
    readonly start: Int32Array,
    readonly members: Int32Array,
  ) {}
}

function binBoxes(boxes: Boxes, margin: number, grid: Grid): Binned {
  const n = boxes.count;
  const cells = new Bins(
    SCRATCH.firstColumn.take(n),
    SCRATCH.lastColumn.take(n),
    SCRATCH.firstRow.take(n),
    SCRATCH.lastRow.take(n),
    SCRATCH.cellStart.take(grid.columns * grid.rows + 1),
    SCRATCH.members.take(0),
  );
  cellRanges(boxes, margin, grid, cells);
  const cellCount = grid.columns * grid.rows;
  cells.start.fill(0, 0, cellCount + 1);
  countPerCell(n, grid.columns, cells);
  const total = runningTotals(cells.start, cellCount);
  const { firstColumn, lastColumn, firstRow, lastRow, start } = cells;
  const filled = new Bins(firstColumn, lastColumn, firstRow, lastRow, start, SCRATCH.members.take(total));
  fillCells(n, grid.columns, filled);
  return filled;
}

function cellRanges(boxes: Boxes, margin: number, grid: Grid, cells: Binned): void {
  const { x, y, width, height } = boxes;
  const { firstColumn, lastColumn, firstRow, lastRow } = cells;
  const { minX, minY, cellSize } = grid;
  const maxColumn = grid.columns - 1;
  const maxRow = grid.rows - 1;
  for (let i = 0; i < boxes.count; i++) {
    const left = (x[i] as number) - margin - minX;
    const right = (x[i] as number) + (width[i] as number) + margin - minX;
    const top = (y[i] as number) - margin - minY;
    const bottom = (y[i] as number) + (height[i] as number) + margin - minY;
    firstColumn[i] = cellOf(left / cellSize, maxColumn);
    lastColumn[i] = cellOf(right / cellSize, maxColumn);
    firstRow[i] = cellOf(top / cellSize, maxRow);
    lastRow[i] = cellOf(bottom / cellSize, maxRow);
  }
}

/**
 * min(last, max(0, floor(at))) for a finite `at`, written with comparisons: Math calls are not inlined
 * before V8 compiles the loop, and four boxes' worth of them cost more than the rest of the loop.
 * Between 0 and `last` (an int32), `at | 0` is the floor.
 */
function cellOf(at: number, last: number): number {
  return at <= 0 ? 0 : at >= last ? last : at | 0;
}

/**
 * Counts the boxes of every cell into `start`. (Hot loops here end their function: code after a loop
 * that V8 compiled on the fly lacks type feedback and would throw the compiled loop away on every call.)
 */
function countPerCell(n: number, columns: number, cells: Binned): void {
  const { firstColumn, lastColumn, firstRow, lastRow, start } = cells;
  for (let i = 0; i < n; i++) {
    const a = firstColumn[i] as number;
    const b = lastColumn[i] as number;
    const d = lastRow[i] as number;
    for (let r = firstRow[i] as number; r <= d; r++) {
      for (let c = a; c <= b; c++) {
        const cell = r * columns + c;
        start[cell] = (start[cell] as number) + 1;
      }
    }
  }
}

/**
 * Puts every box in the lists of its cells. Filling backwards moves `start[cell]` from where the list
 * ends to where it begins, and boxes taken in descending order leave each list ascending.
 */
function fillCells(n: number, columns: number, cells: Binned): void {
  const { firstColumn, lastColumn, firstRow, lastRow, start, members } = cells;
  for (let i = n - 1; i >= 0; i--) {
    const a = firstColumn[i] as number;
    const b = lastColumn[i] as number;
    const top = firstRow[i] as number;
    const d = lastRow[i] as number;
    for (let r = top; r <= d; r++) {
      for (let c = a; c <= b; c++) {
        const cell = r * columns + c;
        const at = (start[cell] as number) - 1;
        start[cell] = at;
        members[at] = i;
      }
    }
  }
}

/**
 * Compares the boxes that share a cell and keeps each meeting pair once: in the cell holding the lower
 * corner of the grown boxes' intersection, that is where at least one of the two starts in each direction.
 */
function gridPairs(
  boxes: Boxes,
  margin: number,
  keep: PairFilter,
  grid: Grid,
  cells: Binned,
  pairs: PairBuffer,
): void {
  const { firstColumn, firstRow, start, members } = cells;
  const { x, y, width, height } = boxes;
  const columns = grid.columns;
  const cellCount = columns * grid.rows;
  for (let cell = 0; cell < cellCount; cell++) {
    const from = start[cell] as number;
    const to = start[cell + 1] as number;
    if (to - from < 2) continue;
    const column = cell % columns;
    const row = (cell - column) / columns;
    // Per member: bit 1 when it starts in this column, bit 2 when it starts in this row. A pair belongs
    // to this cell when the two together have both bits.
    const starts = SCRATCH.startsHere.take(to - from);
    let both = 0;
    for (let p = from; p < to; p++) {
      const i = members[p] as number;
      const bits = (firstColumn[i] === column ? 1 : 0) | (firstRow[i] === row ? 2 : 0);
      starts[p - from] = bits;
      both |= bits;
    }
    if (both !== 3) continue;
    for (let p = from; p < to; p++) {
      const bits = starts[p - from] as number;
      const i = members[p] as number;
      const xi = x[i] as number;
      const yi = y[i] as number;
      const ri = xi + (width[i] as number);
      const bi = yi + (height[i] as number);
      for (let q = p + 1; q < to; q++) {
        if ((bits | (starts[q - from] as number)) !== 3) continue;
        const j = members[q] as number;
        const xj = x[j] as number;
        const yj = y[j] as number;
        const rj = xj + (width[j] as number);
        const bj = yj + (height[j] as number);
        // The box of i grown by the margin against the plain box of j, compared as a box query would be,
        // or the other way round: rounding can make the two differ by an ulp when the gap is the margin.
        // (meets() written out: the first calls of an evaluation run before V8 has compiled anything, and
        // there a call per candidate pair costs more than the comparison.)
        const meet =
          (xi - margin <= rj && xj <= ri + margin && yi - margin <= bj && yj <= bi + margin) ||
          (xj - margin <= ri && xi <= rj + margin && yj - margin <= bi && yi <= bj + margin);
        if (meet && keep(i, j)) pairs.add(i, j);
      }
    }
  }
}

/** Reused between calls (see ScratchBuffer); none of these leave this module. */
const SCRATCH = {
  firstColumn: new ScratchBuffer(),
  lastColumn: new ScratchBuffer(),
  firstRow: new ScratchBuffer(),
  lastRow: new ScratchBuffer(),
  cellStart: new ScratchBuffer(),
  members: new ScratchBuffer(),
  startsHere: new ScratchBuffer(),
};

/** At most this many grid cells per box, so memory stays O(n) however the boxes are spread. */
const CELLS_PER_BOX = 4;
/** Boxes sampled to find the typical block size. */
const SIZE_SAMPLE = 1024;

/**
 * Cell size about the median box size (sampled), so a typical box spans one or two cells; enlarged when
 * the floorplan is so sparse that the grid would have more than {@link CELLS_PER_BOX} cells per box.
 */
function gridShape(boxes: Boxes, extent: Extent): Grid {
  const { spanX, spanY } = extent;
  const n = boxes.count;
  const step = Math.max(1, Math.floor(n / SIZE_SAMPLE));
  const sizes = new Float64Array(Math.ceil(n / step));
  for (let k = 0, i = 0; i < n; i += step, k++) {
    sizes[k] = Math.max(boxes.width[i] as number, boxes.height[i] as number);
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
  return new GridShape(extent.minX, extent.minY, spanX, spanY, columns, rows, cellSize);
}

/** Whether the box of `i` grown by `margin` meets the box of `j` (closed), as an R-tree query computes it. */
function meets(boxes: Boxes, i: number, j: number, margin: number): boolean {
  const { x, y, width, height } = boxes;
  return (
    (x[i] as number) - margin <= (x[j] as number) + (width[j] as number) &&
    (x[j] as number) <= (x[i] as number) + (width[i] as number) + margin &&
    (y[i] as number) - margin <= (y[j] as number) + (height[j] as number) &&
    (y[j] as number) <= (y[i] as number) + (height[i] as number) + margin
  );
}
