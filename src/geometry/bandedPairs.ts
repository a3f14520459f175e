import type { Boxes } from './blockTable';
import { blockRuns, type BlockRuns } from './blockRuns';
import type { NeighbourTable } from './neighbourRows';
import { PairSink } from './orderedPairs';
import { rowsByRun, RunWalks } from './runRows';
import { runMerge, runWalk } from './runWalks';

/**
 * neighbourGrid.ts's groupedNeighbourTable for floorplans made of rows, by runs instead of a grid: the
 * same pairs (boxes of different groups that meet, boxes of one group that share more than `margin`
 * both ways), the same rows in the same order, the pairs that share more than `margin` besides
 * (`shared`), and the runs (`runs`). Returns null when the blocks do not form long runs (see blockRuns.ts) or the runs would cost
 * more than a grid pass; the caller then takes the grid.
 *
 * Method: a run's boxes share their vertical extent, so whether two runs can meet, and how far they share
 * vertically, is decided once per pair of runs; runs are sorted by their top edge and each is paired
 * only with the runs that start before its bottom (a sweep over the vertical axis). For two runs that can
 * meet, both lists are in left-to-right order and a merge walk pairs each box with the boxes of the other
 * run across from it; every candidate pair gets the exact box test of the grid pass (same comparisons,
 * same arithmetic), so rounding decides every pair as it does there. Boxes of one run never share
 * more than the margin across (see blockRuns.ts), and two runs of one group whose vertical extents
 * share no more than the margin have no pair to keep: neither is walked. A 64 × 64 mat array (12,418
 * blocks, 195 runs) then costs some 17,000 merge steps in 385 walks for its 16,400 pairs, where the grid
 * bins every box and tests some 82,000 pairs.
 *
 * Rows come out in ascending order without sorting: runs hold consecutive positions, pairs of runs are
 * walked in order of (lower run, higher run), and a walk meets the boxes of each run in position order,
 * so every row receives its neighbours in ascending order.
 */
export function bandedNeighbourTable(
  boxes: Boxes,
  margin: number,
  /** Each block's code (a block type, say): runs hold blocks of one code. */
  code: Uint8Array,
  /** The group of each code. */
  groupOf: Uint8Array,
  /** When to leave it to the grid (tests lift them to run the banded pass on any boxes). */
  limits: BandLimits = BAND_LIMITS,
  /** What makes the rows from the walks (tests pass an oracle). */
  rows: typeof rowsByRun = rowsByRun,
): NeighbourTable | null {
  const n = boxes.count;
  if (n < 2 || !(margin >= 0)) return null;
  const runs = blockRuns(boxes, code, margin, Math.floor(n / limits.minRunLength));
  if (!runs) return null;
  const group = runGroups(runs, groupOf);
  const order = runsByTop(runs);
  const allPairs = (runs.count * (runs.count - 1)) / 2;
  const keys = new Float64Array(Math.min(allPairs, limits.runPairsPerRun * runs.count + RUN_PAIR_ALLOWANCE));
  const cost = new Float64Array(1);
  const pairCount = meetingRuns(runs, group, margin, order, keys, cost);
  if (pairCount < 0 || (cost[0] as number) > limits.visitsPerBlock * n) return null;
  const walked = keys.subarray(0, pairCount).sort();
  const sink = new PairSink(n);
  const walks = new RunWalks(walked.length);
  walkRunPairs(boxes, margin, runs, group, walked, sink, walks, limits.repeatWalks);
  return rows(runs, walks, sink, n, margin);
}

function runGroups(runs: BlockRuns, groupOf: Uint8Array): Uint8Array {
  const group = new Uint8Array(runs.count);
  for (let r = 0; r < group.length; r++) group[r] = groupOf[runs.code[r] as number] as number;
  return group;
}

/** When the banded pass leaves a floorplan to the grid, which is then cheaper. */
export interface BandLimits {
  /** Runs shorter than this on average: pairs of runs would cost more than they save. */
  readonly minRunLength: number;
  /** Pairs of runs looked at per run (besides a fixed allowance). */
  readonly runPairsPerRun: number;
  /** Boxes the walks may visit per block (the sum of both runs' lengths over the pairs walked). */
  readonly visitsPerBlock: number;
  /** Whether pairs of runs laid out like pairs walked before repeat their pairs (false: tests' oracle). */
  readonly repeatWalks: boolean;
}

const BAND_LIMITS: BandLimits = {
  minRunLength: 4,
  runPairsPerRun: 8,
  visitsPerBlock: 24,
  repeatWalks: true,
};
const RUN_PAIR_ALLOWANCE = 256;

/** The runs in ascending order of their top edge (ties in run order). */
function runsByTop(runs: BlockRuns): Int32Array {
  const order = runOrder(runs.count);
  sortingTops = runs.top;
  return order.sort(byTop);
}

function runOrder(count: number): Int32Array {
  const order = new Int32Array(count);
  for (let r = 0; r < count; r++) order[r] = r;
  return order;
}

/** Read by {@link byTop}: one comparator for every call rather than a closure made per call. */
let sortingTops: Float64Array = new Float64Array(0);
function byTop(a: number, b: number): number {
  return (sortingTops[a] as number) - (sortingTops[b] as number) || a - b;
}

/**
 * The pairs of runs that may hold a pair to keep, as keys lower × count + higher in `keys`; their count,
 * or −1 past the budget. `cost[0]` gets the boxes their walks visit at most besides the pairs they keep.
 * Same-group runs are kept only when they share more than the margin vertically; runs of different
 * groups when they meet vertically as the grid's box test would have it.
 */
function meetingRuns(
  runs: BlockRuns,
  label: Uint8Array,
  margin: number,
  order: Int32Array,
  keys: Float64Array,
  cost: Float64Array,
): number {
  const { top, bottom, start } = runs;
  const count = runs.count;
  let found = 0;
  let visits = 0;
  for (let s = 0; s < count; s++) {
    const a = order[s] as number;
    const topA = top[a] as number;
    const bottomA = bottom[a] as number;
    const labelA = label[a] as number;
    for (let t = s + 1; t < count; t++) {
      const b = order[t] as number;
      const topB = top[b] as number;
      // Later runs start lower still: no box test can pass (either direction) once this one fails.
      if (topB > bottomA + margin && topB - margin > bottomA) break;
      const bottomB = bottom[b] as number;
      if (labelA === label[b]) {
        const shared = (bottomA < bottomB ? bottomA : bottomB) - (topA > topB ? topA : topB);
        if (!(shared > margin)) continue;
      } else if (
        !(topA - margin <= bottomB && topB <= bottomA + margin) &&
        !(topB - margin <= bottomA && topA <= bottomB + margin)
      ) {
        continue;
      }
      if (found === keys.length) return -1;
      keys[found++] = a < b ? a * count + b : b * count + a;
      visits +=
        (start[a + 1] as number) - (start[a] as number) + (start[b + 1] as number) - (start[b] as number);
    }
  }
  cost[0] = visits;
  return found;
}

/**
 * Walks every pair of runs in key order (see {@link bandedNeighbourTable} on why that order), noting each
 * in `walks`. What a walk finds follows from the two runs' left edges and widths, the margin and how the
 * runs meet vertically: a pair of runs whose layouts (see blockRuns.ts) and vertical relation match a
 * pair walked before is not walked when `repeat` holds, but noted as repeating that walk (the rows of a
 * tiled array: a 64 × 64 mat array is walked some five times, its other 380 pairs of runs repeat one of
 * those; runRows.ts fills the rows). Walks that found pairs sharing area (overlaps, rare) are not repeated.
 */
function walkRunPairs(
  boxes: Boxes,
  margin: number,
  runs: BlockRuns,
  label: Uint8Array,
  keys: Float64Array,
  sink: PairSink,
  walks: RunWalks,
  repeat: boolean,
): void {
  const { top, bottom, start, touching, layout } = runs;
  const count = runs.count;
  // Walks that may be repeated, by layouts and relation.
  const walked = new Map<number, number>();
  for (let k = 0; k < keys.length; k++) {
    const key = keys[k] as number;
    const a = Math.floor(key / count);
    const b = key - a * count;
    const topA = top[a] as number;
    const bottomA = bottom[a] as number;
    const topB = top[b] as number;
    const bottomB = bottom[b] as number;
    const a0 = start[a] as number;
    const a1 = start[a + 1] as number;
    const b0 = start[b] as number;
    const b1 = start[b + 1] as number;
    const sharedY = (bottomA < bottomB ? bottomA : bottomB) - (topA > topB ? topA : topB) > margin;
    const sameGroup = label[a] === label[b];
    // The vertical halves of the grid's two box tests (grown a against b, grown b against a).
    const aMeetsB = topA - margin <= bottomB && topB <= bottomA + margin;
    const bMeetsA = topB - margin <= bottomA && topA <= bottomB + margin;
    // Runs whose blocks clear each other are merged in one pass; otherwise the shorter run drives.
    const merge = touching[a] === 0 && touching[b] === 0;
    const aDrives = merge || a1 - a0 <= b1 - b0;
    walks.first[k] = aDrives ? a : b;
    walks.second[k] = aDrives ? b : a;
    const relation = (sameGroup ? 1 : 0) + (aMeetsB ? 2 : 0) + (bMeetsA ? 4 : 0) + (sharedY ? 8 : 0);
    const pattern = ((layout[a] as number) * runs.layouts + (layout[b] as number)) * 16 + relation;
    const before = repeat ? walked.get(pattern) : undefined;
    if (before !== undefined) {
      walks.template[k] = before;
      continue;
    }
    walks.template[k] = k;
    walks.from[k] = sink.count;
    // Runs of one group share more than the margin vertically (meetingRuns kept no others): sharedY.
    const shared = sink.sharedCount;
    if (merge) runMerge(boxes, margin, a0, a1, b0, b1, sameGroup, aMeetsB, bMeetsA, sharedY, sink);
    else if (aDrives) runWalk(boxes, margin, a0, a1, b0, b1, sameGroup, aMeetsB, bMeetsA, sharedY, sink);
    else runWalk(boxes, margin, b0, b1, a0, a1, sameGroup, bMeetsA, aMeetsB, sharedY, sink);
    walks.to[k] = sink.count;
    if (sink.sharedCount === shared) walked.set(pattern, k);
  }
}
