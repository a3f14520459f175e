import type { Boxes } from './blockTable';
import type { PairSink } from './orderedPairs';

/*
 * The walks of bandedPairs.ts over one pair of runs: boxes a0 … a1 − 1 of one run against b0 … b1 − 1 of
 * the other, both in left-to-right order. Each keeps the pairs the grid pass would keep, tested with the
 * grid's comparisons, and hands them to the sink in an order where both a and b never go back.
 *
 * Which pairs: for runs of different groups, pairs that meet: the grid's test `(a grown meets b) ||
 * (b grown meets a)` with its vertical halves known for the whole pair of runs (`aMeetsB`, `bMeetsA`);
 * pairs that also share more than the margin both ways (`sharedY`: the runs do vertically) go to the
 * shared list besides. For runs of one group (`sameGroup`; the runs share more than the margin
 * vertically, which bandedPairs.ts checked), pairs that share more than the margin across, as the grid's
 * sharesBeyond computes it, each also to the shared list.
 */

/**
 * {@link runWalk} for two runs whose blocks clear their neighbours in the run (not touching): an
 * ordinary merge of two sorted lists of disjoint intervals, advancing whichever box ends first (both
 * when they end together). When box a ends no later than box b, no box after b can meet a: the next one
 * starts beyond b's right edge by more than the margin both ways the box test counts it (that is what
 * not touching means), so beyond a's as well; likewise the other way round. Each step tests one pair,
 * and a pair of runs costs fewer than |A| + |B| steps.
 */
export function runMerge(
  boxes: Boxes,
  margin: number,
  a0: number,
  a1: number,
  b0: number,
  b1: number,
  sameGroup: boolean,
  aMeetsB: boolean,
  bMeetsA: boolean,
  sharedY: boolean,
  sink: PairSink,
): void {
  const { x, width } = boxes;
  // A merge keeps at most one pair per step, and takes fewer than |A| + |B| steps.
  sink.reserve(a1 - a0 + b1 - b0);
  const first = sink.first;
  const second = sink.second;
  let count = sink.count;
  let a = a0;
  let b = b0;
  let xa = x[a] as number;
  let ra = xa + (width[a] as number);
  let xb = x[b] as number;
  let rb = xb + (width[b] as number);
  for (;;) {
    const shares = (ra < rb ? ra : rb) - (xa > xb ? xa : xb) > margin;
    if (
      sameGroup
        ? shares
        : (aMeetsB && xa - margin <= rb && xb <= ra + margin) ||
          (bMeetsA && xb - margin <= ra && xa <= rb + margin)
    ) {
      first[count] = a;
      second[count] = b;
      count++;
      if (sharedY && shares) sink.share(a, b);
    }
    // Both advance when they end together (aligned tiles): each side's next box clears the other.
    const bEndsFirst = rb <= ra;
    if (ra <= rb) {
      if (++a === a1) break;
      xa = x[a] as number;
      ra = xa + (width[a] as number);
    }
    if (bEndsFirst) {
      if (++b === b1) break;
      xb = x[b] as number;
      rb = xb + (width[b] as number);
    }
  }
  sink.count = count;
}

/**
 * The pairs of two runs whose blocks may touch their neighbours in the run: for each box of the first
 * run (the shorter one drives), the boxes of the other run from the first that does not end before it
 * to the last that does not start after it.
 */
export function runWalk(
  boxes: Boxes,
  margin: number,
  a0: number,
  a1: number,
  b0: number,
  b1: number,
  sameGroup: boolean,
  aMeetsB: boolean,
  bMeetsA: boolean,
  sharedY: boolean,
  sink: PairSink,
): void {
  const { x, width } = boxes;
  let p = b0;
  for (let a = a0; a < a1; a++) {
    const xa = x[a] as number;
    const ra = xa + (width[a] as number);
    const left = xa - margin;
    const right = ra + margin;
    // Boxes of b that end before a (both tests fail) fail them for every later a as well; with a
    // margin ≥ 0, such boxes share nothing with a either.
    while (p < b1) {
      const rb = (x[p] as number) + (width[p] as number);
      if (rb < left && rb + margin < xa) p++;
      else break;
    }
    for (let b = p; b < b1; b++) {
      const xb = x[b] as number;
      // This box and every later one start past a (both tests fail).
      if (xb > right && xb - margin > ra) break;
      const rb = xb + (width[b] as number);
      const shares = (ra < rb ? ra : rb) - (xa > xb ? xa : xb) > margin;
      if (
        sameGroup
          ? shares
          : (aMeetsB && left <= rb && xb <= right) || (bMeetsA && xb - margin <= ra && xa <= rb + margin)
      ) {
        sink.add(a, b);
        if (sharedY && shares) sink.share(a, b);
      }
    }
  }
}
