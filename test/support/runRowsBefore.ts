/**
 * runRows.ts rowsByRun as it was before copiedRows.ts (session 6): a copying run's rows copied neighbour by
 * neighbour with a lookup of each neighbour's run. Kept as the oracle of test/geometry/copiedRows.test.ts.
 */
import type { BlockRuns } from '../../src/geometry/blockRuns';
import { NeighbourRows, runningTotals, type NeighbourTable } from '../../src/geometry/neighbourRows';
import type { PairSink } from '../../src/geometry/orderedPairs';
import { ScratchBuffer } from '../../src/geometry/scratchBuffer';

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
const SCRATCH = { cursor: new ScratchBuffer(), runOf: new ScratchBuffer() };

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
  const by = walksByRun(walks, taken);
  const model = modelRuns(runs, walks, taken, by);
  const end = new Int32Array(n + 1);
  rowLengths(runs, walks, sink, taken, by, model, end);
  const total = runningTotals(end, n);
  const rowStart = new Int32Array(n);
  rowStart.set(end.subarray(0, n - 1), 1);
  const list = new Int32Array(total);
  fillRuns(runs, walks, sink, taken, by, model, rowStart, end, list);
  const partners = new Int32Array(by.length);
  for (let e = 0; e < by.length; e++) partners[e] = partnerOf(walks, by[e] as number);
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
 * and its model have as many). Every neighbour of a run lies in one of its partner runs.
 */
export class RunCopies {
  constructor(
    readonly model: Int32Array,
    readonly partnersFrom: Int32Array,
    readonly partners: Int32Array,
  ) {}
}

/**
 * Each run's walks in key order, as walk · 2 + side (0: the walk's first run, 1: its second): run r's
 * are entries `taken[r]` … `taken[r + 1] − 1` of the list returned.
 */
function walksByRun(walks: RunWalks, taken: Int32Array): Int32Array {
  const sides = 2 * walks.count;
  for (let w = 0; w < sides; w++) {
    const r = runOfSide(walks, w) + 1;
    taken[r] = (taken[r] as number) + 1;
  }
  for (let r = 1; r < taken.length; r++) taken[r] = (taken[r] as number) + (taken[r - 1] as number);
  const by = new Int32Array(sides);
  const fill = taken.slice(0, taken.length - 1);
  for (let w = 0; w < sides; w++) {
    const r = runOfSide(walks, w);
    by[fill[r] as number] = w;
    fill[r] = (fill[r] as number) + 1;
  }
  return by;
}

/**
 * For each run, the first run of its kind: the same layout, taken by walks repeating the same walks on
 * the same side in the same order.
 */
function modelRuns(runs: BlockRuns, walks: RunWalks, taken: Int32Array, by: Int32Array): Int32Array {
  const model = new Int32Array(runs.count);
  const kinds = new Map<string, number>();
  for (let r = 0; r < runs.count; r++) {
    let key = `${runs.layout[r] as number}`;
    for (let e = taken[r] as number; e < (taken[r + 1] as number); e++) {
      const w = by[e] as number;
      key += `,${2 * (walks.template[w >> 1] as number) + (w & 1)}`;
    }
    const known = kinds.get(key);
    if (known === undefined) kinds.set(key, r);
    model[r] = known ?? r;
  }
  return model;
}

/** Each box's number of neighbours into `degree`: counted for a model run, copied for the others. */
function rowLengths(
  runs: BlockRuns,
  walks: RunWalks,
  sink: PairSink,
  taken: Int32Array,
  by: Int32Array,
  model: Int32Array,
  degree: Int32Array,
): void {
  const start = runs.start;
  for (let r = 0; r < runs.count; r++) {
    const m = model[r] as number;
    if (m !== r) {
      degree.set(degree.subarray(start[m] as number, start[m + 1] as number), start[r] as number);
      continue;
    }
    for (let e = taken[r] as number; e < (taken[r + 1] as number); e++) {
      const w = by[e] as number;
      const t = walks.template[w >> 1] as number;
      const shift = shiftOf(runs, walks, w >> 1, t, (w & 1) === 1);
      countPairs(
        degree,
        w & 1 ? sink.second : sink.first,
        walks.from[t] as number,
        walks.to[t] as number,
        shift,
      );
    }
  }
}

/** The rows of every run: a model run's from its walks' pairs, every other run's from its model's. */
function fillRuns(
  runs: BlockRuns,
  walks: RunWalks,
  sink: PairSink,
  taken: Int32Array,
  by: Int32Array,
  model: Int32Array,
  rowStart: Int32Array,
  end: Int32Array,
  list: Int32Array,
): void {
  const { start, count } = runs;
  const cursor = SCRATCH.cursor.take(rowStart.length);
  cursor.set(rowStart);
  const runOf = SCRATCH.runOf.take(rowStart.length);
  for (let r = 0; r < count; r++) runOf.fill(r, start[r] as number, start[r + 1] as number);
  const partnerShift = new Int32Array(count);
  for (let r = 0; r < count; r++) {
    const m = model[r] as number;
    const first = taken[r] as number;
    const last = taken[r + 1] as number;
    if (m === r) {
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
    // The model's partner runs, each with how far this run's partner in the same place lies from it.
    for (let e = first, f = taken[m] as number; e < last; e++, f++) {
      const partner = partnerOf(walks, by[f] as number);
      partnerShift[partner] =
        (start[partnerOf(walks, by[e] as number)] as number) - (start[partner] as number);
    }
    const from = rowStart[start[m] as number] as number;
    const to = end[(start[m + 1] as number) - 1] as number;
    copyShifted(list, runOf, partnerShift, from, to, (rowStart[start[r] as number] as number) - from);
  }
}

/** The run on side w & 1 of walk w >> 1. */
function runOfSide(walks: RunWalks, w: number): number {
  return (w & 1 ? walks.second[w >> 1] : walks.first[w >> 1]) as number;
}

/** The other run of walk w >> 1 than the one its side w & 1 names. */
function partnerOf(walks: RunWalks, w: number): number {
  return runOfSide(walks, w ^ 1);
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

/** Neighbours from … to − 1 copied `offset` further on, each shifted by its run's partner shift. */
function copyShifted(
  list: Int32Array,
  runOf: Int32Array,
  partnerShift: Int32Array,
  from: number,
  to: number,
  offset: number,
): void {
  for (let p = from; p < to; p++) {
    const j = list[p] as number;
    list[p + offset] = j + (partnerShift[runOf[j] as number] as number);
  }
}
