/*
 * The serving forest's pass (servingForest.ts) a run of mats at a time, where the run's serving lists
 * repeat: every mat lists the first one's strips moved on by its place in the run (mat i lists e + i for
 * each strip e of the first), as the rows of a tiled array do; the connection pass says which runs do
 * (MatTable.runLists). Then what the mat-by-mat pass would do to the trees is a few native copies and
 * fills per run: each strip the first mat lists stands for the stretch e … e + L − 1 of positions its
 * run's mats list. Anything else is left to the mat-by-mat pass.
 */

/** Mats with more strips than this in one part of their list are left to the mat-by-mat pass. */
const MOST_STRIPS = 8;

/** Per part, the distinct strips the first mat of a run lists (scratch), and how many. */
const starts = [new Int32Array(MOST_STRIPS), new Int32Array(MOST_STRIPS)] as const;
const startCount = new Int32Array(2);

/** A part's strips are two side by side (e and e + 1): each mat shares one with the next, the run is one tree. */
const CHAIN = -3;
/** No way to join the part without a step per mat. */
const NO_PLAN = -2;
/** Every stretch of the part new (no position of it in any tree): each mat roots a tree of its own. */
const ALL_NEW = -1;

/** The trees of both parts and the orientation codes (what joining a run reads and writes). */
export class ForestParts {
  constructor(
    readonly up: readonly [Int32Array, Int32Array],
    readonly trees: Int32Array,
    readonly facing: Uint8Array,
  ) {}
}

/**
 * Joins mats k0 … k0 + length − 1, at positions m0 … m0 + length − 1 and with repeating serving lists
 * (see the file's comment; the caller knows it from MatTable.runLists), into the trees as the mat-by-mat
 * pass would, when each part is of a shape whose joining is known without a step per mat: strips by
 * column, none seen before or one stretch seen before (each mat joins that strip's tree), or a chain of
 * strips none seen before. `f0`, `f1`: the orientation codes of the mats' two parts. Writes their
 * matIndexAt. False when the run is not such a run: then the trees and orientations are untouched.
 */
export function joinRegularRun(
  parts: ForestParts,
  offsets: Int32Array,
  positions: Int32Array,
  k0: number,
  m0: number,
  length: number,
  f0: number,
  f1: number,
  matIndexAt: Int32Array,
): boolean {
  const a = offsets[3 * k0] as number;
  const b = offsets[3 * k0 + 1] as number;
  const c = offsets[3 * k0 + 2] as number;
  if (b - a > MOST_STRIPS || c - b > MOST_STRIPS) return false;
  const plan0 = planPart(parts, 0, positions, a, b, m0, length);
  const plan1 = planPart(parts, 1, positions, b, c, m0, length);
  if (plan0 === NO_PLAN || plan1 === NO_PLAN) return false;
  // A strip listed in both parts takes the orientation of the later (mat, part): the run's parts must
  // not share a strip unless both parts face alike.
  const span0 = plan0 === CHAIN ? length + 1 : length;
  const span1 = plan1 === CHAIN ? length + 1 : length;
  for (let n = 0; n < (startCount[0] as number) && f0 !== f1; n++)
    for (let q = 0; q < (startCount[1] as number); q++) {
      const e = starts[0][n] as number;
      const g = starts[1][q] as number;
      if (e < g + span1 && g < e + span0) return false;
    }
  for (let i = 0; i < length; i++) matIndexAt[m0 + i] = k0 + i;
  applyPart(parts, 0, plan0, m0, length, f0);
  applyPart(parts, 1, plan1, m0, length, f1);
  return true;
}

/**
 * How to join one part (the first mat's strips `from` … `to` − 1, written distinct to {@link starts}):
 * {@link CHAIN} (the chain new), {@link ALL_NEW}, the index in `starts` of the one stretch seen before
 * (every position of it in a tree; the others new), or {@link NO_PLAN}.
 */
function planPart(
  parts: ForestParts,
  part: number,
  positions: Int32Array,
  from: number,
  to: number,
  m0: number,
  length: number,
): number {
  const first = starts[part] as Int32Array;
  let n = 0;
  for (let p = from; p < to; p++) {
    const s = positions[p] as number;
    let q = 0;
    while (q < n && first[q] !== s) q++;
    if (q === n) first[n++] = s;
  }
  startCount[part] = n;
  const up = parts.up[part] as Int32Array;
  // A chain of two strips side by side, e and e + 1: its mats and strips e … e + length are one tree.
  const chain = n === 2 && Math.abs((first[0] as number) - (first[1] as number)) === 1;
  if (chain) first[0] = Math.min(first[0] as number, first[1] as number);
  const span = chain ? length + 1 : length;
  let plan = chain ? CHAIN : ALL_NEW;
  for (let j = 0; j < (chain ? 1 : n); j++) {
    const e = first[j] as number;
    // Columns: no two mats share a strip (stretches apart by the run's length at least), and no stretch
    // holds the run's own mats.
    for (let q = j + 1; q < n && !chain; q++) if (Math.abs((first[q] as number) - e) < length) return NO_PLAN;
    if (e < m0 + length && m0 < e + span) return NO_PLAN;
    const unseen = up.indexOf(-1, e);
    if (unseen < 0 || unseen >= e + span) {
      // Every position in a tree: one such stretch per part, and only by columns.
      if (plan !== ALL_NEW) return NO_PLAN;
      plan = j;
      continue;
    }
    // Otherwise none in a tree of either part: none is a mat joined before (mats are joined in table
    // order: those before the run) and none is listed yet (every listed position has an orientation).
    const faces = parts.facing.subarray(e, e + span);
    if (e < m0 || faces.indexOf(1) >= 0 || faces.indexOf(2) >= 0) return NO_PLAN;
  }
  return plan;
}

/** Joins one part of the run as {@link planPart} planned it, and gives its strips orientation `f`. */
function applyPart(
  parts: ForestParts,
  part: number,
  plan: number,
  m0: number,
  length: number,
  f: number,
): void {
  const up = parts.up[part] as Int32Array;
  const first = starts[part] as Int32Array;
  const m1 = m0 + length;
  const { trees, facing } = parts;
  if (plan === CHAIN) {
    // One new tree rooted at the first mat, as the mat-by-mat pass roots it.
    const e = first[0] as number;
    up.fill(m0, m0, m1);
    up.fill(m0, e, e + length + 1);
    facing.fill(f, e, e + length + 1);
    trees[part] = (trees[part] as number) + 1;
    return;
  }
  if (plan === ALL_NEW) {
    for (let m = m0; m < m1; m++) up[m] = m;
    trees[part] = (trees[part] as number) + length;
  } else {
    // Each mat joins the tree of its strip seen before (through that strip's parent, in its tree).
    const seen = first[plan] as number;
    up.copyWithin(m0, seen, seen + length);
  }
  // The new stretches hang below the mats.
  for (let j = 0; j < (startCount[part] as number); j++) {
    const e = first[j] as number;
    if (j !== plan) up.copyWithin(e, m0, m1);
    facing.fill(f, e, e + length);
  }
}
