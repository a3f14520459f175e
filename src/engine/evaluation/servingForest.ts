import type { BlockRuns } from '../../geometry/blockRuns';
import { MAT_CODE, type BlockTable, type MatKind } from '../../geometry/blockTable';
import type { MatTable } from './matTable';
import type { ServingPart } from './reachComponents';
import { ForestParts, joinRegularRun } from './servingForestRuns';

/** A block no mat lists, so what lines it would serve is unknown (an orientation code of {@link ServingForest.facing}). */
export const UNSERVING = 0;
/** A strip along a mat's top or bottom edge: it lies across. */
export const ALONG_HORIZONTAL_EDGE = 1;
/** A strip along a mat's left or right edge: it stands. */
export const ALONG_VERTICAL_EDGE = 2;

/**
 * The mats and the strips their serving lists name, joined into trees (union–find, per table position)
 * for both parts of the lists at once: two positions share a tree exactly when they share a component of
 * {@link reachComponents} in that part. Whether a decoder reaches a mat needs only that, and one pass over
 * the serving lists finds it without turning the lists around per strip (which the components labelled
 * block by block need; the report builds those only when an edit asks for them).
 */
export class ServingForest {
  private constructor(
    /** Per part, per table position: the position above it in its tree, itself for a root, −1 if unlisted. */
    private readonly up: readonly [Int32Array, Int32Array],
    /** Per part: how many trees, one per component. */
    readonly trees: Int32Array,
    /**
     * Per table position, the direction of the mat edge it serves (an orientation code above): that of
     * the last mat in report order listing it, its driver part after its sense-amplifier part. A short
     * piece of a strip may be taller than wide and still lie across. The back-to-back check reads it; it
     * is found here because the pass over the serving lists is the cost.
     */
    readonly facing: Uint8Array,
  ) {}

  /** The root of position `i`'s tree in `part` (−1 for a position no mat lists and that is no mat). */
  rootOf(part: ServingPart, i: number): number {
    return rootIn(this.up[part], i);
  }

  /**
   * One pass over the mats in report order: a mat starts a tree, and each strip it lists joins the mat's
   * tree (a strip seen before brings its tree along). In a tiled array a strip is met again from the next
   * mat of its row or column, so almost every step is one comparison.
   */
  static of(
    mats: MatTable,
    table: BlockTable,
    /** Written on the way: each position's mat (report index), −1 elsewhere (see matIndexByPosition). */
    matIndexAt: Int32Array = new Int32Array(table.count).fill(-1),
    /** The table's runs (geometry/blockRuns.ts), when the caller has them: runs of mats whose lists repeat are joined at once. */
    runs: BlockRuns | null = null,
  ): ServingForest {
    const up0 = new Int32Array(table.count).fill(-1);
    const up1 = new Int32Array(table.count).fill(-1);
    const trees = new Int32Array(2);
    const facing = new Uint8Array(table.count);
    // Each kind's strip orientations, read once per kind rather than once per mat.
    const { kinds } = table;
    const facingOfKind = new Uint8Array(2 * kinds.length);
    for (let n = 0; n < kinds.length; n++) {
      const vertical = (kinds[n] as MatKind).block.bitlineAxis === 'vertical';
      facingOfKind[2 * n] = vertical ? ALONG_HORIZONTAL_EDGE : ALONG_VERTICAL_EDGE;
      facingOfKind[2 * n + 1] = vertical ? ALONG_VERTICAL_EDGE : ALONG_HORIZONTAL_EDGE;
    }
    const parts = new ForestParts([up0, up1], trees, facing);
    // Runs of mats in report order (mats are listed in table order), each at once where the connection
    // pass found its serving lists repeating mat by mat (MatTable.runLists) and every kind of mat faces
    // alike (bit lines along one axis).
    const lists = runs && facingOfKind.every((f, i) => f === facingOfKind[i & 1]) ? mats.runLists : null;
    let k = 0;
    for (let r = 0; lists && runs && r < runs.count; r++) {
      if (runs.code[r] !== MAT_CODE) continue;
      const m0 = runs.start[r] as number;
      const to = Math.min(mats.count, k + (runs.start[r + 1] as number) - m0);
      const { servingOffsets, servingPositions } = mats;
      const f0 = facingOfKind[0] as number;
      const f1 = facingOfKind[1] as number;
      if (
        lists.regular[r] !== 1 ||
        lists.firstMat[r] !== k ||
        !joinRegularRun(parts, servingOffsets, servingPositions, k, m0, to - k, f0, f1, matIndexAt)
      )
        joinMats(mats, table, parts, facingOfKind, matIndexAt, k, to);
      k = to;
    }
    if (k < mats.count) joinMats(mats, table, parts, facingOfKind, matIndexAt, k, mats.count);
    return new ServingForest([up0, up1], trees, facing);
  }
}

/** Joins mats from … to − 1 (report order) one by one. */
function joinMats(
  mats: MatTable,
  table: BlockTable,
  parts: ForestParts,
  facingOfKind: Uint8Array,
  matIndexAt: Int32Array,
  from: number,
  to: number,
): void {
  const { trees } = parts;
  joinServingLists(
    from,
    to,
    trees[0] as number,
    trees[1] as number,
    mats.position,
    mats.servingOffsets,
    mats.servingPositions,
    table.kindOf,
    facingOfKind,
    parts.up[0],
    parts.up[1],
    trees,
    parts.facing,
    matIndexAt,
    table,
  );
}

/**
 * The pass of {@link ServingForest.of}. V8 compiles its loop while it runs, and what is read before or
 * after the loop has no type feedback then (the function's feedback is allocated during the loop), so
 * compiled code would be thrown away at its start or end: the loop ends the function, and everything it
 * reads comes in as an argument.
 */
function joinServingLists(
  from: number,
  to: number,
  /** The trees so far, per part. */
  treesBefore0: number,
  treesBefore1: number,
  position: Int32Array,
  servingOffsets: Int32Array,
  servingPositions: Int32Array,
  kindOf: Int32Array,
  /** Per mat kind, the orientation code of its sense-amplifier strips, then of its driver strips. */
  facingOfKind: Uint8Array,
  up0: Int32Array,
  up1: Int32Array,
  trees: Int32Array,
  facing: Uint8Array,
  matIndexAt: Int32Array,
  /** For the error about a listed mat that is not one. */
  table: BlockTable,
): void {
  let trees0 = treesBefore0;
  let trees1 = treesBefore1;
  for (let k = from; k < to; k++) {
    const m = position[k] as number;
    const kind = kindOf[m] as number;
    if (kind < 0) notAMat(table, m);
    matIndexAt[m] = k;
    const a = servingOffsets[3 * k] as number;
    const b = servingOffsets[3 * k + 1] as number;
    const c = servingOffsets[3 * k + 2] as number;
    // The mat joins the tree of its first strip that has one, or starts a tree with its first strip.
    let f = facingOfKind[2 * kind] as number;
    let root = -1;
    for (let p = a; p < b; p++) {
      const s = servingPositions[p] as number;
      facing[s] = f;
      let r = up0[s] as number;
      if (r < 0) {
        if (root < 0) {
          root = m;
          up0[m] = m;
          trees0++;
        }
        up0[s] = root;
        continue;
      }
      if (r === root) continue;
      // Path halving: every other step points past its parent.
      while ((up0[r] as number) !== r) {
        const g = up0[up0[r] as number] as number;
        up0[r] = g;
        r = g;
      }
      if (root < 0) up0[m] = r;
      else if (r !== root) {
        up0[root] = r;
        trees0--;
      }
      root = r;
      up0[s] = r;
    }
    if (root < 0) {
      up0[m] = m;
      trees0++;
    }
    trees[0] = trees0;
    f = facingOfKind[2 * kind + 1] as number;
    root = -1;
    for (let p = b; p < c; p++) {
      const s = servingPositions[p] as number;
      facing[s] = f;
      let r = up1[s] as number;
      if (r < 0) {
        if (root < 0) {
          root = m;
          up1[m] = m;
          trees1++;
        }
        up1[s] = root;
        continue;
      }
      if (r === root) continue;
      while ((up1[r] as number) !== r) {
        const g = up1[up1[r] as number] as number;
        up1[r] = g;
        r = g;
      }
      if (root < 0) up1[m] = r;
      else if (r !== root) {
        up1[root] = r;
        trees1--;
      }
      root = r;
      up1[s] = r;
    }
    if (root < 0) {
      up1[m] = m;
      trees1++;
    }
    trees[1] = trees1;
  }
}

function rootIn(up: Int32Array, i: number): number {
  let r = up[i] as number;
  if (r < 0) return -1;
  while ((up[r] as number) !== r) {
    const g = up[up[r] as number] as number;
    up[r] = g;
    r = g;
  }
  return r;
}

function notAMat(table: BlockTable, i: number): never {
  throw new Error(`block ${table.blocks[i]?.id ?? i} is not a mat`);
}
