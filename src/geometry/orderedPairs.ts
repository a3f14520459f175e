import { SharedPairs } from './neighbourRows';
import { ScratchBuffer } from './scratchBuffer';

/** Reused between calls (see ScratchBuffer); none of these leave this module. */
const SCRATCH = {
  first: new ScratchBuffer(),
  second: new ScratchBuffer(),
  shared: new ScratchBuffer(),
};

/**
 * Pairs as the walks of bandedPairs.ts find them (each pair's boxes in `first` and `second`, in the
 * order found), and the pairs that share area. runRows.ts makes the rows.
 */
export class PairSink {
  first: Int32Array;
  second: Int32Array;
  count = 0;
  private sharedPairs = SCRATCH.shared.take(16);
  /** Pairs handed to {@link share} so far. */
  sharedCount = 0;

  constructor(n: number) {
    this.first = SCRATCH.first.take(2 * n);
    this.second = SCRATCH.second.take(2 * n);
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

  share(a: number, b: number): void {
    if (2 * this.sharedCount + 2 > this.sharedPairs.length)
      this.sharedPairs = SCRATCH.shared.grow(2 * this.sharedPairs.length, 2 * this.sharedCount);
    this.sharedPairs[2 * this.sharedCount] = a < b ? a : b;
    this.sharedPairs[2 * this.sharedCount + 1] = a < b ? b : a;
    this.sharedCount++;
  }

  /** The pairs handed to {@link share}, in ascending order. */
  shared(n: number, margin: number): SharedPairs {
    return sharedInOrder(this.sharedPairs, this.sharedCount, n, margin);
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
