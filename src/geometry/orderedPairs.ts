import type { BlockRuns } from './blockRuns';
import { NeighbourRows, runningTotals, SharedPairs, type NeighbourTable } from './neighbourRows';
import { ScratchBuffer } from './scratchBuffer';

/** Reused between calls (see ScratchBuffer); none of these leave this module. */
const SCRATCH = {
  first: new ScratchBuffer(),
  second: new ScratchBuffer(),
  shared: new ScratchBuffer(),
  cursor: new ScratchBuffer(),
};

/** Pairs as the walks find them, each box's count of pairs, and the pairs that share area. */
export class PairSink {
  first: Int32Array;
  second: Int32Array;
  count = 0;
  /** Pairs of box i in `degree[i]`; one longer, for the running totals. */
  readonly degree: Int32Array;
  private sharedPairs = SCRATCH.shared.take(16);
  /** Pairs handed to {@link share} so far. */
  sharedCount = 0;

  constructor(n: number) {
    this.first = SCRATCH.first.take(2 * n);
    this.second = SCRATCH.second.take(2 * n);
    this.degree = new Int32Array(n + 1);
  }

  grow(): void {
    this.first = SCRATCH.first.grow(2 * this.count, this.count);
    this.second = SCRATCH.second.grow(2 * this.count, this.count);
  }

  /** Room for `more` pairs after those found so far. */
  reserve(more: number): void {
    const needed = this.count + more;
    if (needed <= this.first.length) return;
    this.first = SCRATCH.first.grow(Math.max(needed, 2 * this.count), this.count);
    this.second = SCRATCH.second.grow(Math.max(needed, 2 * this.count), this.count);
  }

  add(a: number, b: number): void {
    if (this.count === this.first.length) this.grow();
    this.first[this.count] = a;
    this.second[this.count] = b;
    this.count++;
  }

  /**
   * Pairs from..to − 1 found again, box for box shifted: the first of each pair by `shiftFirst`, the
   * second by `shiftSecond` (bandedPairs.ts: two runs laid out like two it walked before).
   */
  repeat(from: number, to: number, shiftFirst: number, shiftSecond: number): void {
    this.reserve(to - from);
    this.count = repeatPairs(
      this.first,
      this.second,
      this.degree,
      from,
      to,
      shiftFirst,
      shiftSecond,
      this.count,
    );
  }

  share(a: number, b: number): void {
    if (2 * this.sharedCount + 2 > this.sharedPairs.length)
      this.sharedPairs = SCRATCH.shared.grow(2 * this.sharedPairs.length, 2 * this.sharedCount);
    this.sharedPairs[2 * this.sharedCount] = a < b ? a : b;
    this.sharedPairs[2 * this.sharedCount + 1] = a < b ? b : a;
    this.sharedCount++;
  }

  /** The rows, filled in the order the pairs were found (bandedPairs.ts keeps each row ascending). */
  table(n: number, margin: number, runs: BlockRuns): NeighbourTable {
    const end = this.degree;
    const total = runningTotals(end, n);
    const start = new Int32Array(n);
    start.set(end.subarray(0, n - 1), 1);
    const list = new Int32Array(total);
    const cursor = SCRATCH.cursor.take(n);
    cursor.set(start);
    scatterInOrder(this.first, this.second, this.count, cursor, list);
    return new NeighbourRows(
      start,
      end,
      list,
      sharedInOrder(this.sharedPairs, this.sharedCount, n, margin),
      runs,
    );
  }
}

/** {@link PairSink.repeat}'s loop; returns the new count. */
function repeatPairs(
  first: Int32Array,
  second: Int32Array,
  degree: Int32Array,
  from: number,
  to: number,
  shiftFirst: number,
  shiftSecond: number,
  count: number,
): number {
  let at = count;
  for (let k = from; k < to; k++) {
    const i = (first[k] as number) + shiftFirst;
    const j = (second[k] as number) + shiftSecond;
    first[at] = i;
    second[at] = j;
    at++;
    degree[i] = (degree[i] as number) + 1;
    degree[j] = (degree[j] as number) + 1;
  }
  return at;
}

/** Each pair into both rows, each row filled forwards from its start. */
function scatterInOrder(
  first: Int32Array,
  second: Int32Array,
  count: number,
  cursor: Int32Array,
  list: Int32Array,
): void {
  for (let k = 0; k < count; k++) {
    const i = first[k] as number;
    const j = second[k] as number;
    const at = cursor[i] as number;
    list[at] = j;
    cursor[i] = at + 1;
    const bt = cursor[j] as number;
    list[bt] = i;
    cursor[j] = bt + 1;
  }
}

/** The shared pairs in ascending order of first and second (they are few: overlaps are design errors). */
function sharedInOrder(pairs: Int32Array, count: number, n: number, margin: number): SharedPairs {
  const keys = new Float64Array(count);
  for (let k = 0; k < count; k++) keys[k] = (pairs[2 * k] as number) * n + (pairs[2 * k + 1] as number);
  keys.sort();
  const sorted = new Int32Array(2 * count);
  for (let k = 0; k < count; k++) {
    const first = Math.floor((keys[k] as number) / n);
    sorted[2 * k] = first;
    sorted[2 * k + 1] = (keys[k] as number) - first * n;
  }
  return new SharedPairs(margin, sorted);
}
