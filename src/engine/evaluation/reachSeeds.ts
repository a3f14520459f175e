import { abutmentSpan } from '../../geometry/abutment';
import { BLOCK_TYPE_CODES, kindAt, MAT_CODE, type BlockTable } from '../../geometry/blockTable';
import type { BlockRuns } from '../../geometry/blockRuns';
import { ABUTMENT_TOLERANCE } from '../../geometry/rect';
import { bitlineEndSides } from '../../geometry/stripFit';
import type { DecoderEdges } from './decoderEdges';

/*
 * Where the lines of a decoder type enter the stack of mats and strips (the seeds of the decoder-reach
 * check, decoderReach.ts): the decoders themselves, the strips of the check's type abutting one, and for
 * column decoders the mats with a bit-line end against one.
 */

export const COLUMN_DECODER = BLOCK_TYPE_CODES.indexOf('columnDecoder');

/** The decoder and strip types of one reach check. */
export interface SeedCheck {
  readonly decoderCode: number;
  readonly stripCode: number;
}

const scratch = new Float64Array(2);

/**
 * True when boxes i and j share a stretch of edge on any side of i: {@link abutmentSpan}'s test of each
 * side, the same arithmetic, with each box read once (top and bottom share the stretch along x, left and
 * right the stretch along y).
 */
function abutting(table: BlockTable, i: number, j: number): boolean {
  const tol = ABUTMENT_TOLERANCE;
  const tx = table.x[i] as number;
  const ty = table.y[i] as number;
  const tr = tx + (table.width[i] as number);
  const tb = ty + (table.height[i] as number);
  const nx = table.x[j] as number;
  const ny = table.y[j] as number;
  const nr = nx + (table.width[j] as number);
  const nb = ny + (table.height[j] as number);
  if (
    (!(Math.abs(nb - ty) > tol) || !(Math.abs(ny - tb) > tol)) &&
    Math.min(tr, nr) - tx - (Math.max(tx, nx) - tx) > tol
  )
    return true;
  return (
    (!(Math.abs(nr - tx) > tol) || !(Math.abs(nx - tr) > tol)) &&
    Math.min(tb, nb) - ty - (Math.max(ty, ny) - ty) > tol
  );
}

/**
 * Where the lines of the two reach checks' decoders enter the stack of mats and strips, per table
 * position: the decoders themselves, the strips of the check's type abutting one, and (for column
 * decoders) mats with a bit-line end against one. One pass over the table for both checks (the first
 * evaluation runs it before V8 has compiled it, so one pass instead of two is half the cost), testing
 * only the blocks inside the decoders' grown bounding box exactly; a check whose decoders have no finite
 * box tests every candidate.
 */
export function seedsOfChecks(
  table: BlockTable,
  matIndexAt: Int32Array,
  a: SeedCheck,
  edgesA: DecoderEdges | null,
  b: SeedCheck,
  edgesB: DecoderEdges | null,
  /** The table's runs by block type with the margin ABUTMENT_TOLERANCE, when the caller has them. */
  runs: BlockRuns | null = null,
): readonly [Uint8Array, Uint8Array] {
  const seedA = new Uint8Array(table.count);
  const seedB = new Uint8Array(table.count);
  if (edgesA !== null) for (const d of edgesA.decoders) seedA[d] = 1;
  if (edgesB !== null) for (const d of edgesB.decoders) seedB[d] = 1;
  const found = candidatesOfChecks(table, matIndexAt, a, edgesA, b, edgesB, runs);
  for (let n = 0; n < found; n++) {
    const v = inBoxes[n] as number;
    if (v >= 0) {
      if (seedAt(table, matIndexAt, edgesA, v, a.decoderCode, a.stripCode)) seedA[v] = 1;
    } else if (seedAt(table, matIndexAt, edgesB, ~v, b.decoderCode, b.stripCode)) seedB[~v] = 1;
  }
  return [seedA, seedB];
}

/**
 * The candidates of {@link seedsOfChecks}, as {@link blocksInBoxes} writes them to {@link inBoxes} (run by
 * run when `runs` is given, in another order); returns how many.
 */
export function candidatesOfChecks(
  table: BlockTable,
  matIndexAt: Int32Array,
  a: SeedCheck,
  edgesA: DecoderEdges | null,
  b: SeedCheck,
  edgesB: DecoderEdges | null,
  runs: BlockRuns | null,
): number {
  if (inBoxes.length < 2 * table.count) inBoxes = new Int32Array(2 * table.count);
  return runs === null
    ? blocksInBoxesOf(table, matIndexAt, a, edgesA, b, edgesB)
    : blocksInBoxesByRuns(
        runs,
        table.x,
        table.width,
        matIndexAt,
        edgesA === null ? -1 : a.stripCode,
        edgesA !== null && a.decoderCode === COLUMN_DECODER,
        reachOf(edgesA),
        edgesB === null ? -1 : b.stripCode,
        edgesB !== null && b.decoderCode === COLUMN_DECODER,
        reachOf(edgesB),
        inBoxes,
      );
}

/** The first `count` candidates {@link candidatesOfChecks} wrote, sorted (for tests). */
export function candidatesFound(count: number): Int32Array {
  return inBoxes.slice(0, count).sort();
}

/** {@link blocksInBoxes} of a table. */
function blocksInBoxesOf(
  table: BlockTable,
  matIndexAt: Int32Array,
  a: SeedCheck,
  edgesA: DecoderEdges | null,
  b: SeedCheck,
  edgesB: DecoderEdges | null,
): number {
  // A check without decoders has no seeds: its strip code matches no block and its box is never consulted.
  return blocksInBoxes(
    table.count,
    table.type,
    matIndexAt,
    edgesA === null ? -1 : a.stripCode,
    edgesA !== null && a.decoderCode === COLUMN_DECODER,
    ...narrowFirst(table, reachOf(edgesA)),
    edgesB === null ? -1 : b.stripCode,
    edgesB !== null && b.decoderCode === COLUMN_DECODER,
    ...narrowFirst(table, reachOf(edgesB)),
    inBoxes,
  );
}

/**
 * A box (left, top, right, bottom) as the table's start and size arrays across its narrow side, its span
 * there, the arrays along its long side and its span there: a row decoder's box is narrow in x, a column
 * decoder's in y, so most blocks leave {@link blocksInBoxes} after one or two comparisons.
 */
function narrowFirst(
  table: BlockTable,
  box: Float64Array,
): [Float64Array, Float64Array, number, number, Float64Array, Float64Array, number, number] {
  const [left, top, right, bottom] = box as unknown as [number, number, number, number];
  const { x, y, width, height } = table;
  return right - left <= bottom - top
    ? [x, width, left, right, y, height, top, bottom]
    : [y, height, top, bottom, x, width, left, right];
}

/**
 * What {@link blocksInBoxes} writes, in another order, found run by run (geometry/blockRuns.ts): the
 * blocks of a run share their top and bottom edges, so one test per run leaves out the runs beside the
 * boxes, and a run's left edges never decrease, so a binary search finds where its blocks may enter a
 * box and the walk stops at the first block right of it. `boxA` and `boxB` are (left, top, right, bottom).
 */
function blocksInBoxesByRuns(
  runs: BlockRuns,
  x: Float64Array,
  width: Float64Array,
  matIndexAt: Int32Array,
  stripA: number,
  matsA: boolean,
  boxA: Float64Array,
  stripB: number,
  matsB: boolean,
  boxB: Float64Array,
  out: Int32Array,
): number {
  let n = 0;
  for (let r = 0; r < runs.count; r++) {
    const code = runs.code[r] as number;
    if (code === stripA || (matsA && code === MAT_CODE))
      n = blocksOfRunInBox(runs, r, x, width, code !== stripA ? matIndexAt : null, boxA, 0, out, n);
    if (code === stripB || (matsB && code === MAT_CODE))
      n = blocksOfRunInBox(runs, r, x, width, code !== stripB ? matIndexAt : null, boxB, -1, out, n);
  }
  return n;
}

/**
 * Appends to `out` from `n` the blocks of run `r` at least partly inside `box` (only mats of the report
 * when `matIndexAt` is given), each as its position XOR `flip` (0, or −1 for the complement).
 */
function blocksOfRunInBox(
  runs: BlockRuns,
  r: number,
  x: Float64Array,
  width: Float64Array,
  matIndexAt: Int32Array | null,
  box: Float64Array,
  flip: number,
  out: Int32Array,
  n: number,
): number {
  if ((runs.top[r] as number) > (box[3] as number) || (runs.bottom[r] as number) < (box[1] as number))
    return n;
  const left = box[0] as number;
  const right = box[2] as number;
  const from = runs.start[r] as number;
  const end = runs.start[r + 1] as number;
  // A block of a run ends no further right than the margin past the next block's left edge (blockRuns.ts
  // cuts a run where one reaches back further), so every block before the one before the first left
  // edge at or past this threshold ends left of the box. The threshold leaves the margin twice and a
  // rounding allowance of 2⁻⁴⁰ of the box's edge.
  const threshold = left - 2 * ABUTMENT_TOLERANCE - Math.abs(left) * 2 ** -40;
  let lo = from;
  let hi = end;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if ((x[mid] as number) < threshold) lo = mid + 1;
    else hi = mid;
  }
  for (let i = lo > from ? lo - 1 : from; i < end; i++) {
    const bx = x[i] as number;
    if (bx > right) break;
    if (bx + (width[i] as number) < left || (matIndexAt !== null && (matIndexAt[i] as number) < 0)) continue;
    out[n++] = i ^ flip;
  }
  return n;
}

/** Scratch for {@link blocksInBoxes}: at least twice as long as the table. */
let inBoxes = new Int32Array(1024);

/**
 * Writes to `out`, in table order, each candidate block of check A (a strip of its type, or a mat where
 * mats count) lying at least partly inside box A as its position, and each of check B inside box B as
 * the position's complement (~i), and returns how many it wrote: the test against
 * {@link DecoderEdges.reach}, written out, each box tested first across its narrow side (see
 * {@link narrowFirst}). The exact test runs afterwards, outside this loop: V8 compiles the loop while it
 * runs, and with that test inside it inlined a dozen geometry functions (a 20 ms compile for a loop that
 * runs once per evaluation). What the loop reads comes in as arguments: read before the loop it would
 * have no type feedback when V8 compiles the function (its feedback is allocated during the loop), and the
 * code would be thrown away. Tables cut into runs take {@link blocksInBoxesByRuns} instead.
 */
function blocksInBoxes(
  count: number,
  type: Uint8Array,
  matIndexAt: Int32Array,
  stripA: number,
  matsA: boolean,
  startA: Float64Array,
  sizeA: Float64Array,
  fromA: number,
  toA: number,
  crossA: Float64Array,
  crossSizeA: Float64Array,
  crossFromA: number,
  crossToA: number,
  stripB: number,
  matsB: boolean,
  startB: Float64Array,
  sizeB: Float64Array,
  fromB: number,
  toB: number,
  crossB: Float64Array,
  crossSizeB: Float64Array,
  crossFromB: number,
  crossToB: number,
  out: Int32Array,
): number {
  let n = 0;
  for (let i = 0; i < count; i++) {
    const t = type[i] as number;
    if (t === stripA || (matsA && (matIndexAt[i] as number) >= 0)) {
      const at = startA[i] as number;
      if (!(at > toA || at + (sizeA[i] as number) < fromA)) {
        const cross = crossA[i] as number;
        if (!(cross > crossToA || cross + (crossSizeA[i] as number) < crossFromA)) out[n++] = i;
      }
    }
    if (t === stripB || (matsB && (matIndexAt[i] as number) >= 0)) {
      const at = startB[i] as number;
      if (!(at > toB || at + (sizeB[i] as number) < fromB)) {
        const cross = crossB[i] as number;
        if (!(cross > crossToB || cross + (crossSizeB[i] as number) < crossFromB)) out[n++] = ~i;
      }
    }
  }
  return n;
}

/** The box of a check without decoders: a placeholder, never consulted (no block is a candidate for it). */
const NOWHERE = Float64Array.of(Infinity, Infinity, -Infinity, -Infinity);
/** The box of decoders with an edge that is not finite: every candidate is tested. */
const EVERYWHERE = Float64Array.of(-Infinity, -Infinity, Infinity, Infinity);

/** The box the candidates of a check are taken from (left, top, right, bottom). */
function reachOf(edges: DecoderEdges | null): Float64Array {
  return edges === null ? NOWHERE : (edges.reach ?? EVERYWHERE);
}

/** Up to this many decoders of a type, {@link seedAt} tests each rather than searching their edges. */
const FEW_DECODERS = 4;

/** True when the block at table position `i` is a seed (see {@link seedsOfChecks}). */
export function seedAt(
  table: BlockTable,
  matIndexAt: Int32Array,
  edges: DecoderEdges | null,
  i: number,
  decoderCode: number,
  stripCode: number,
): boolean {
  if (edges === null) return false;
  const type = table.type[i];
  if (type === decoderCode) return true;
  const isStrip = type === stripCode;
  if (!isStrip && !(decoderCode === COLUMN_DECODER && (matIndexAt[i] as number) >= 0)) return false;
  // A few decoders are all tested (near() would read the block's edges to pick among them).
  const few = edges.decoders.length <= FEW_DECODERS;
  const found = few ? edges.decoders.length : edges.near(table, i);
  const candidates = few ? edges.decoders : edges.candidates;
  for (let c = 0; c < found; c++) {
    const d = candidates[c] as number;
    if (isStrip) {
      if (abutting(table, d, i)) return true;
      continue;
    }
    for (const side of bitlineEndSides(kindAt(table, i).block.bitlineAxis))
      if (abutmentSpan(table, i, d, side, scratch, 0)) return true;
  }
  return false;
}
