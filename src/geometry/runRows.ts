import type { BlockRuns } from './blockRuns';
import { copyRows, rowPattern } from './copiedRows';
import { NeighbourRows, type NeighbourTable } from './neighbourRows';
import type { PairSink } from './orderedPairs';
import { ScratchBuffer } from './scratchBuffer';

/**
 * The pairs of runs bandedPairs.ts looked at, in key order (lower run, higher run). Walk k took runs
 * `first[k]` and `second[k]` in that order (the first of each pair it found lies in `first[k]`). A walk
 * repeats walk `template[k]` (itself when it was walked), whose pairs lie at `from` … `to − 1` in the
 * sink: the same pairs, each box shifted by where its run starts against where the template's did.
 */
export class RunWalks {
  readonly first: Int32Array;
  readonly second: Int32Array;
  readonly template: Int32Array;
  readonly from: Int32Array;
  readonly to: Int32Array;

  constructor(readonly count: number) {
    this.first = new Int32Array(count);
    this.second = new Int32Array(count);
    this.template = new Int32Array(count);
    this.from = new Int32Array(count);
    this.to = new Int32Array(count);
  }
}

/** Reused between calls (see ScratchBuffer); none of these leave this module. */
const SCRATCH = { cursor: new ScratchBuffer() };

/**
 * The rows of the pairs the walks found, run by run. A run's rows take their neighbours from the walks
 * that took the run, in key order; two runs of one layout taken by walks that repeat the same walks, on
 * the same side, in the same order (the rows of a tiled array) have rows of the same lengths, and every
 * neighbour of the later one lies where the earlier one's does, shifted by where its run starts against
 * where the earlier one's partner run starts. So only the first run of each such kind is filled from
 * pairs; every later one copies its row lengths (TypedArray.set) and its neighbours, shifted, which
 * costs one step per neighbour in the interpreter instead of one per pair per row and per walk.
 * Rows come out as PairSink.table fills them from every pair (tested).
 */
export function rowsByRun(
  runs: BlockRuns,
  walks: RunWalks,
  sink: PairSink,
  n: number,
  margin: number,
): NeighbourTable {
  const taken = new Int32Array(runs.count + 1);
  const by = new Int32Array(2 * walks.count);
  const partners = new Int32Array(2 * walks.count);
  walksByRun(walks, taken, by, partners);
  const model = modelRuns(runs, walks, taken, by);
  const end = new Int32Array(n + 1);
  const total = rowLengths(runs, walks, sink, taken, by, model, end);
  end[n] = total;
  const list = new Int32Array(total);
  fillRuns(runs, walks, sink, taken, by, partners, model, end, list);
  const rowStart = new Int32Array(n);
  rowStart.set(end.subarray(0, n - 1), 1);
  return new NeighbourRows(
    rowStart,
    end,
    list,
    sink.shared(n, margin),
    runs,
    new RunCopies(model, taken, partners),
  );
}

/**
 * Which run's rows each run copies, for passes that can copy what they worked out from rows too: run r's
 * rows are those of run `model[r]` (r itself when its rows were filled from pairs), every neighbour in
 * partner run `partners[partnersFrom[m] + k]` moved to the same place in run
 * `partners[partnersFrom[r] + k]` (shifted by where that run starts against where the other does), for
 * k = 0 … partnersFrom[r + 1] − partnersFrom[r] − 1 (the walks that took the run, in key order; a run
 * and its model have as many). Every neighbour of a run lies in one of its partner runs. A run and its
 * model have the same layout, and so have the two partner runs in one place k (a walk is repeated only
 * for runs of the same layouts); rows follow each other in block order (row i + 1 starts where row i
 * ends). servedRuns.ts relies on each of these.
 */
export class RunCopies {
  constructor(
    readonly model: Int32Array,
    readonly partnersFrom: Int32Array,
    readonly partners: Int32Array,
  ) {}
}

/**
 * Each run's walks in key order, as walk · 2 + side (0: the walk's first run, 1: its second), into `by`,
 * and the run across each into `partners`: run r's are entries `taken[r]` … `taken[r + 1] − 1`.
 */
function walksByRun(walks: RunWalks, taken: Int32Array, by: Int32Array, partners: Int32Array): void {
  const { first, second, count } = walks;
  for (let k = 0; k < count; k++) {
    const a = (first[k] as number) + 1;
    const b = (second[k] as number) + 1;
    taken[a] = (taken[a] as number) + 1;
    taken[b] = (taken[b] as number) + 1;
  }
  for (let r = 1; r < taken.length; r++) taken[r] = (taken[r] as number) + (taken[r - 1] as number);
  const fill = taken.slice(0, taken.length - 1);
  for (let k = 0; k < count; k++) {
    const a = first[k] as number;
    const b = second[k] as number;
    const atA = fill[a] as number;
    by[atA] = 2 * k;
    partners[atA] = b;
    fill[a] = atA + 1;
    const atB = fill[b] as number;
    by[atB] = 2 * k + 1;
    partners[atB] = a;
    fill[b] = atB + 1;
  }
}

/**
 * For each run, the first run of its kind: the same layout, taken by walks repeating the same walks on
 * the same side in the same order.
 */
function modelRuns(runs: BlockRuns, walks: RunWalks, taken: Int32Array, by: Int32Array): Int32Array {
  const { count, layout } = runs;
  const model = new Int32Array(count);
  // Each entry's walk as the walk it repeats and the side; the models of each layout, latest first.
  const repeats = new Int32Array(by.length);
  for (let e = 0; e < by.length; e++) {
    const w = by[e] as number;
    repeats[e] = 2 * (walks.template[w >> 1] as number) + (w & 1);
  }
  const latest = new Int32Array(runs.layouts).fill(-1);
  const before = new Int32Array(count);
  for (let r = 0; r < count; r++) {
    let m = latest[layout[r] as number] as number;
    while (
      m >= 0 &&
      !sameEntries(
        repeats,
        taken[m] as number,
        taken[m + 1] as number,
        taken[r] as number,
        taken[r + 1] as number,
      )
    )
      m = before[m] as number;
    if (m < 0) {
      m = r;
      before[r] = latest[layout[r] as number] as number;
      latest[layout[r] as number] = r;
    }
    model[r] = m;
  }
  return model;
}

/** Whether entries a … a1 − 1 and b … b1 − 1 of `values` are equal, one by one. */
function sameEntries(values: Int32Array, a: number, a1: number, b: number, b1: number): boolean {
  if (a1 - a !== b1 - b) return false;
  for (let k = 0; k < a1 - a; k++) if (values[a + k] !== values[b + k]) return false;
  return true;
}

/**
 * Each box of a model run's number of neighbours into `degree` (the other runs' are left to their
 * models'); returns the number of neighbours of all boxes (a run has as many as its model).
 */
function rowLengths(
  runs: BlockRuns,
  walks: RunWalks,
  sink: PairSink,
  taken: Int32Array,
  by: Int32Array,
  model: Int32Array,
  degree: Int32Array,
): number {
  const size = new Int32Array(runs.count);
  let total = 0;
  for (let r = 0; r < runs.count; r++) {
    const m = model[r] as number;
    if (m === r) {
      for (let e = taken[r] as number; e < (taken[r + 1] as number); e++) {
        const w = by[e] as number;
        const t = walks.template[w >> 1] as number;
        const from = walks.from[t] as number;
        const to = walks.to[t] as number;
        const shift = shiftOf(runs, walks, w >> 1, t, (w & 1) === 1);
        countPairs(degree, w & 1 ? sink.second : sink.first, from, to, shift);
        size[r] = (size[r] as number) + to - from;
      }
    }
    total += size[m] as number;
  }
  return total;
}

/**
 * The rows of every run, in run order (rows follow each other in `list` in block order): a model run's
 * ends are the running totals of its degrees (in `end`, from rowLengths) and its rows are filled from its
 * walks' pairs; every other run's ends and rows are its model's, moved (copiedRows.ts).
 */
function fillRuns(
  runs: BlockRuns,
  walks: RunWalks,
  sink: PairSink,
  taken: Int32Array,
  by: Int32Array,
  partners: Int32Array,
  model: Int32Array,
  end: Int32Array,
  list: Int32Array,
): void {
  const { start, count } = runs;
  const cursor = SCRATCH.cursor.take(end.length);
  // Per run, at most as many partners as walks.
  const shifts = new Int32Array(by.length);
  const partnerFrom = new Int32Array(by.length);
  const partnerTo = new Int32Array(by.length);
  const patterns = new Map<number, Int32Array>();
  let at = 0;
  for (let r = 0; r < count; r++) {
    const m = model[r] as number;
    const first = taken[r] as number;
    const last = taken[r + 1] as number;
    const blocksFrom = start[r] as number;
    const blocksTo = start[r + 1] as number;
    if (m === r) {
      // Where each row begins, where the filling of each row stands.
      cursor[blocksFrom] = at;
      at = runningEnds(end, blocksFrom, blocksTo, at);
      cursor.set(end.subarray(blocksFrom, blocksTo - 1), blocksFrom + 1);
      for (let e = first; e < last; e++) {
        const w = by[e] as number;
        const k = w >> 1;
        const t = walks.template[k] as number;
        const side = (w & 1) === 1;
        fillRows(
          list,
          cursor,
          side ? sink.second : sink.first,
          side ? sink.first : sink.second,
          walks.from[t] as number,
          walks.to[t] as number,
          shiftOf(runs, walks, k, t, side),
          shiftOf(runs, walks, k, t, !side),
        );
      }
      continue;
    }
    const modelFrom = start[m] as number;
    const from = modelFrom > 0 ? (end[modelFrom - 1] as number) : 0;
    let pattern = patterns.get(m);
    if (!pattern) {
      for (let f = taken[m] as number, k = 0; f < (taken[m + 1] as number); f++, k++) {
        const partner = partners[f] as number;
        partnerFrom[k] = start[partner] as number;
        partnerTo[k] = start[partner + 1] as number;
      }
      pattern = rowPattern(
        list,
        end,
        modelFrom,
        start[m + 1] as number,
        partnerFrom,
        partnerTo,
        last - first,
      );
      patterns.set(m, pattern);
    }
    // How far each of this run's partner runs lies from the model's in the same place.
    for (let e = first, f = taken[m] as number, k = 0; e < last; e++, f++, k++)
      shifts[k] = (start[partners[e] as number] as number) - (start[partners[f] as number] as number);
    at = copyRows(list, end, pattern, shifts, from, at, blocksFrom);
  }
}

/** Turns the degrees of boxes from … to − 1 (in `end`) into where their rows end, rows from `at` on. */
function runningEnds(end: Int32Array, from: number, to: number, at: number): number {
  let sum = at;
  for (let i = from; i < to; i++) {
    sum += end[i] as number;
    end[i] = sum;
  }
  return sum;
}

/** How far walk k's run on a side starts from its template t's run on that side (second: side 1). */
function shiftOf(runs: BlockRuns, walks: RunWalks, k: number, t: number, second: boolean): number {
  const side = second ? walks.second : walks.first;
  return (runs.start[side[k] as number] as number) - (runs.start[side[t] as number] as number);
}

/** Counts pairs from … to − 1 into the rows of their boxes on one side (`boxes`, shifted). */
function countPairs(degree: Int32Array, boxes: Int32Array, from: number, to: number, shift: number): void {
  for (let p = from; p < to; p++) {
    const i = (boxes[p] as number) + shift;
    degree[i] = (degree[i] as number) + 1;
  }
}

/** Pairs from … to − 1 into the rows of their boxes on one side, each row filled forwards. */
function fillRows(
  list: Int32Array,
  cursor: Int32Array,
  mine: Int32Array,
  other: Int32Array,
  from: number,
  to: number,
  shiftMine: number,
  shiftOther: number,
): void {
  for (let p = from; p < to; p++) {
    const i = (mine[p] as number) + shiftMine;
    const at = cursor[i] as number;
    list[at] = (other[p] as number) + shiftOther;
    cursor[i] = at + 1;
  }
}
