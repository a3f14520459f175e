import type { BlockRuns } from './blockRuns';
import type { RunCopies } from './runRows';
import { ScratchBuffer } from './scratchBuffer';

/**
 * Neighbours of every block in compressed rows: block i's neighbours are `list[start[i]]` up to
 * `list[end[i] − 1]`, in ascending order, never i itself. Rows may sit anywhere in `list`.
 */
export interface NeighbourTable {
  readonly start: Int32Array;
  readonly end: Int32Array;
  readonly list: Int32Array;
  /**
   * Every pair of boxes that share more than a margin in both directions, when the pass that made the
   * table found them on its way (null when it did not): a whole-die evaluation then need not test every
   * neighbour again for overlaps.
   */
  readonly shared?: SharedPairs | null;
  /**
   * The runs the boxes were cut into (blockRuns.ts), when the pass that made the table worked by runs
   * (null or absent when it did not): other whole-die passes can work per run too.
   */
  readonly runs?: BlockRuns | null;
  /** Which run's rows each run copies (runRows.ts), when the table was made by runs; null or absent otherwise. */
  readonly copies?: RunCopies | null;
}

/**
 * Pairs of boxes that share more than `margin` (m) in both directions (an overlap, not a touch): pair k
 * is `pairs[2k]` < `pairs[2k + 1]`, in ascending order of the first and then the second.
 */
export class SharedPairs {
  constructor(
    readonly margin: number,
    readonly pairs: Int32Array,
  ) {}

  get count(): number {
    return this.pairs.length >> 1;
  }
}

/** A table as a class, so that it keeps one shape from call to call (see blockTable.ts, TableRows). */
export class NeighbourRows implements NeighbourTable {
  constructor(
    readonly start: Int32Array,
    readonly end: Int32Array,
    readonly list: Int32Array,
    readonly shared: SharedPairs | null = null,
    readonly runs: BlockRuns | null = null,
    readonly copies: RunCopies | null = null,
  ) {}
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
  return new NeighbourRows(start, end, list);
}

/** Reused between calls (see ScratchBuffer); none of these leave this module. */
const SCRATCH = {
  pairFirst: new ScratchBuffer(),
  pairSecond: new ScratchBuffer(),
  starts: new ScratchBuffer(),
};

/** Pairs (i < j) collected in scratch buffers, then turned into rows of both directions. */
export class PairBuffer {
  private first = SCRATCH.pairFirst.take(1024);
  private second = SCRATCH.pairSecond.take(1024);
  private count = 0;

  add(i: number, j: number): void {
    if (this.count === this.first.length) {
      this.first = SCRATCH.pairFirst.grow(2 * this.count, this.count);
      this.second = SCRATCH.pairSecond.grow(2 * this.count, this.count);
    }
    this.first[this.count] = i;
    this.second[this.count] = j;
    this.count++;
  }

  table(n: number): NeighbourTable {
    return rowsOfPairs(this.first, this.second, this.count, n);
  }
}

/** Rows of both directions from a list of pairs (i < j), each row ascending. */
function rowsOfPairs(first: Int32Array, second: Int32Array, count: number, n: number): NeighbourTable {
  // Degrees go to ends[i], whose running totals are where each row ends; filling backwards moves them to
  // where the rows begin.
  const ends = new Int32Array(n + 1);
  countEnds(first, second, count, ends);
  const total = runningTotals(ends, n);
  const list = new Int32Array(total);
  const starts = SCRATCH.starts.take(n);
  starts.set(ends.subarray(0, n));
  scatterPairs(first, second, count, starts, list);
  sortRows(list, starts, ends, n);
  return new NeighbourRows(starts.slice(0, n), ends, list);
}

/** Degree of every box, counted into `ends[i]`. */
function countEnds(first: Int32Array, second: Int32Array, count: number, ends: Int32Array): void {
  for (let k = 0; k < count; k++) {
    const a = first[k] as number;
    const b = second[k] as number;
    ends[a] = (ends[a] as number) + 1;
    ends[b] = (ends[b] as number) + 1;
  }
}

/** Each pair into both rows, filled backwards from where each row ends. */
function scatterPairs(
  first: Int32Array,
  second: Int32Array,
  count: number,
  starts: Int32Array,
  list: Int32Array,
): void {
  for (let k = count - 1; k >= 0; k--) {
    const i = first[k] as number;
    const j = second[k] as number;
    const at = (starts[i] as number) - 1;
    list[at] = j;
    starts[i] = at;
    const bt = (starts[j] as number) - 1;
    list[bt] = i;
    starts[j] = bt;
  }
}

function sortRows(list: Int32Array, starts: Int32Array, ends: Int32Array, n: number): void {
  for (let i = 0; i < n; i++) {
    const from = starts[i] as number;
    const to = ends[i] as number;
    // Rows filled backwards from pairs found in ascending order are often sorted already.
    let sorted = true;
    for (let k = from + 1; k < to; k++) {
      if ((list[k - 1] as number) > (list[k] as number)) {
        sorted = false;
        break;
      }
    }
    if (!sorted) sortRange(list, from, to);
  }
}

/** Turns counts[0 … length − 1] into running totals, sets counts[length] to the sum and returns it. */
export function runningTotals(counts: Int32Array, length: number): number {
  addUp(counts, length);
  const sum = length > 0 ? (counts[length - 1] as number) : 0;
  counts[length] = sum;
  return sum;
}

function addUp(counts: Int32Array, length: number): void {
  for (let k = 1; k < length; k++) counts[k] = (counts[k] as number) + (counts[k - 1] as number);
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
