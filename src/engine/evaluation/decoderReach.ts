import { abutmentSpan, type Side } from '../../geometry/abutment';
import {
  BLOCK_TYPE_CODES,
  kindAt,
  SENSE_AMP_STRIP_CODE,
  WORDLINE_DRIVER_STRIP_CODE,
  type BlockTable,
} from '../../geometry/blockTable';
import { bitlineEndSides } from '../../geometry/stripFit';
import { DecoderEdges } from './decoderEdges';
import { groupLabel } from './findingText';
import type { MatTable } from './matTable';
import {
  ComponentsOnDemand,
  isReached,
  reachComponents,
  reachComponentsAfterEdit,
  reachedMats,
  type LayoutEdit,
  type ReachComponents,
  type ServingPart,
} from './reachComponents';
import { ServingForest } from './servingForest';
import type { Finding } from './report';

const ROW_DECODER = BLOCK_TYPE_CODES.indexOf('rowDecoder');
const COLUMN_DECODER = BLOCK_TYPE_CODES.indexOf('columnDecoder');
const ALL_SIDES: readonly Side[] = ['top', 'bottom', 'left', 'right'];
const scratch = new Float64Array(2);

/** True when boxes i and j share a stretch of edge on any side of i. */
function abutting(table: BlockTable, i: number, j: number): boolean {
  for (const side of ALL_SIDES) if (abutmentSpan(table, i, j, side, scratch, 0)) return true;
  return false;
}

/**
 * Where the lines of decoders of type `decoderCode` enter the stack of mats and strips, per table position:
 * the decoders themselves, the strips of type `stripCode` abutting one, and (for column decoders) mats
 * with a bit-line end against one. Found by binary search on the decoders' sorted edges, one pass in all.
 */
export function reachSeeds(
  table: BlockTable,
  matIndexAt: Int32Array,
  edges: DecoderEdges | null,
  decoderCode: number,
  stripCode: number,
): Uint8Array {
  const seed = new Uint8Array(table.count);
  if (edges === null) return seed;
  for (const d of edges.decoders) seed[d] = 1;
  const box = edges.reach;
  if (box === null) {
    for (let i = 0; i < table.count; i++)
      if (table.type[i] !== decoderCode && seedAt(table, matIndexAt, edges, i, decoderCode, stripCode))
        seed[i] = 1;
    return seed;
  }
  return seedsInBox(table, matIndexAt, edges, box, decoderCode, stripCode, seed);
}

/**
 * The seeds among blocks that lie at least partly inside the decoders' grown bounding box `box` (the
 * test of {@link DecoderEdges.mayAbut}, written out: this loop visits every block of the first evaluation).
 */
function seedsInBox(
  table: BlockTable,
  matIndexAt: Int32Array,
  edges: DecoderEdges,
  box: Float64Array,
  decoderCode: number,
  stripCode: number,
  seed: Uint8Array,
): Uint8Array {
  const { type, x, y, width, height } = table;
  const left = box[0] as number;
  const top = box[1] as number;
  const right = box[2] as number;
  const bottom = box[3] as number;
  const matsToo = decoderCode === COLUMN_DECODER;
  for (let i = 0; i < table.count; i++) {
    if (type[i] !== stripCode && !(matsToo && (matIndexAt[i] as number) >= 0)) continue;
    const bx = x[i] as number;
    const by = y[i] as number;
    if (bx > right || by > bottom || bx + (width[i] as number) < left || by + (height[i] as number) < top)
      continue;
    if (seedAt(table, matIndexAt, edges, i, decoderCode, stripCode)) seed[i] = 1;
  }
  return seed;
}

/**
 * {@link reachSeeds} of the two reach checks in one pass over the table (the first evaluation runs this
 * loop before V8 has compiled it, so one pass instead of two is half the cost). Falls back to one pass per
 * check when a check's decoders have no finite bounding box.
 */
function seedsOfChecks(
  table: BlockTable,
  matIndexAt: Int32Array,
  a: ReachCheck,
  edgesA: DecoderEdges | null,
  b: ReachCheck,
  edgesB: DecoderEdges | null,
): readonly [Uint8Array, Uint8Array] {
  if ((edgesA !== null && edgesA.reach === null) || (edgesB !== null && edgesB.reach === null))
    return [
      reachSeeds(table, matIndexAt, edgesA, a.decoderCode, a.stripCode),
      reachSeeds(table, matIndexAt, edgesB, b.decoderCode, b.stripCode),
    ];
  const seedA = new Uint8Array(table.count);
  const seedB = new Uint8Array(table.count);
  if (edgesA !== null) for (const d of edgesA.decoders) seedA[d] = 1;
  if (edgesB !== null) for (const d of edgesB.decoders) seedB[d] = 1;
  if (inBoxes.length < 2 * table.count) inBoxes = new Int32Array(2 * table.count);
  const boxA = narrowFirst(table, edgesA?.reach ?? NOWHERE);
  const boxB = narrowFirst(table, edgesB?.reach ?? NOWHERE);
  // A check without decoders has no seeds: its strip code matches no block and its box is never consulted.
  const found = blocksInBoxes(
    table.count,
    table.type,
    matIndexAt,
    edgesA === null ? -1 : a.stripCode,
    edgesA !== null && a.decoderCode === COLUMN_DECODER,
    boxA.start,
    boxA.size,
    boxA.from,
    boxA.to,
    boxA.cross,
    boxA.crossSize,
    boxA.crossFrom,
    boxA.crossTo,
    edgesB === null ? -1 : b.stripCode,
    edgesB !== null && b.decoderCode === COLUMN_DECODER,
    boxB.start,
    boxB.size,
    boxB.from,
    boxB.to,
    boxB.cross,
    boxB.crossSize,
    boxB.crossFrom,
    boxB.crossTo,
    inBoxes,
  );
  for (let n = 0; n < found; n++) {
    const v = inBoxes[n] as number;
    if (v >= 0) {
      if (seedAt(table, matIndexAt, edgesA, v, a.decoderCode, a.stripCode)) seedA[v] = 1;
    } else if (seedAt(table, matIndexAt, edgesB, ~v, b.decoderCode, b.stripCode)) seedB[~v] = 1;
  }
  return [seedA, seedB];
}

/** Scratch for {@link blocksInBoxes}: at least twice as long as the table. */
let inBoxes = new Int32Array(1024);

/**
 * Writes to `out`, in table order, each candidate block of check A (a strip of its type, or a mat where
 * mats count) lying at least partly inside box A as its position, and each of check B inside box B as
 * the position's complement (~i), and returns how many it wrote: the test of {@link DecoderEdges.mayAbut},
 * written out, with each box tested first across its narrow side (a row decoder's box is narrow in x, a
 * column decoder's in y) so that most blocks leave after one or two comparisons. The exact test runs
 * afterwards, outside this loop: V8 compiles the loop while it runs, and with that test inside it
 * inlined a dozen geometry functions (a 20 ms compile for a loop that runs once per evaluation). What
 * the loop reads comes in as arguments: read before the loop it would have no type feedback when V8
 * compiles the function (its feedback is allocated during the loop), and the code would be thrown away.
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

/**
 * A box (m) as the table's start and size arrays across its narrow side and its span there, then along
 * its long side and its span there.
 */
class NarrowFirst {
  constructor(
    readonly start: Float64Array,
    readonly size: Float64Array,
    readonly from: number,
    readonly to: number,
    readonly cross: Float64Array,
    readonly crossSize: Float64Array,
    readonly crossFrom: number,
    readonly crossTo: number,
  ) {}
}

/** Box `box` (left, top, right, bottom) of blocks of `table`, narrow side first. */
function narrowFirst(table: BlockTable, box: Float64Array): NarrowFirst {
  const left = box[0] as number;
  const top = box[1] as number;
  const right = box[2] as number;
  const bottom = box[3] as number;
  return right - left <= bottom - top
    ? new NarrowFirst(table.x, table.width, left, right, table.y, table.height, top, bottom)
    : new NarrowFirst(table.y, table.height, top, bottom, table.x, table.width, left, right);
}

/** The box of a check without decoders: a placeholder, never consulted (no block is a candidate for it). */
const NOWHERE = Float64Array.of(Infinity, Infinity, -Infinity, -Infinity);

/** True when the block at table position `i` is a seed of {@link reachSeeds}. */
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
  const found = edges.near(table, i);
  const candidates = edges.candidates;
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

/** For each table position, the index of its mat in the report, or −1. */
export function matIndexByPosition(mats: MatTable, count: number): Int32Array {
  const index = new Int32Array(count).fill(-1);
  for (let k = 0; k < mats.count; k++) index[mats.position[k] as number] = k;
  return index;
}

/**
 * Mats (by report index) that a decoder of type `decoderCode` reaches through the strips that serve them:
 * a decoder abutting a serving strip reaches every mat that strip serves, each of those mats reaches the
 * other strips serving it, and so on (a global word line crosses every mat and driver strip of its row; a
 * column-select line every mat and sense-amplifier strip of its column). A mat whose serving list holds the
 * decoder itself (a row decoder driving a small mat directly) is reached too, and so is a mat with a bit-line
 * end against a column decoder. Common practice (no source): the decoder's lines run along the stack of
 * mats and strips it sits beside.
 */
export function matsReachedBy(
  table: BlockTable,
  mats: MatTable,
  decoderCode: number,
  stripCode: number,
  part: ServingPart,
): Uint8Array {
  const matIndexAt = matIndexByPosition(mats, table.count);
  const seed = reachSeeds(table, matIndexAt, DecoderEdges.of(table, decoderCode), decoderCode, stripCode);
  return reachedMats(reachComponents(mats, matIndexAt, part, seed), mats);
}

/** One of the two reach checks: which decoders, along which strips and part of the serving lists. */
interface ReachCheck {
  readonly decoderCode: number;
  readonly stripCode: number;
  readonly part: ServingPart;
  readonly kind: Finding['kind'];
  readonly detail: string;
}

const REACH_CHECKS: readonly ReachCheck[] = [
  {
    decoderCode: ROW_DECODER,
    stripCode: WORDLINE_DRIVER_STRIP_CODE,
    part: 1,
    kind: 'noRowDecoder',
    detail: 'word lines reach no row decoder through their driver strips',
  },
  {
    decoderCode: COLUMN_DECODER,
    stripCode: SENSE_AMP_STRIP_CODE,
    part: 0,
    kind: 'noColumnDecoder',
    detail: 'bit lines reach no column decoder through their sense-amplifier strips',
  },
];

/** A mat with no serving strip in `part` already has an error for its unserved lines. */
function hasServing(mats: MatTable, k: number, part: ServingPart): boolean {
  return mats.servingOffsets[3 * k + part] !== mats.servingOffsets[3 * k + part + 1];
}

/** Mats with at least one serving strip in the check's part that no decoder reaches, as one grouped finding. */
function unreachedFinding(mats: MatTable, reached: Uint8Array, check: ReachCheck): Finding | null {
  const ids: string[] = [];
  const labels: string[] = [];
  for (let k = 0; k < mats.count; k++) {
    const at = mats.position[k] as number;
    if (reached[k] === 1 || !hasServing(mats, k, check.part)) continue;
    const block = mats.blocks[at];
    ids.push(block?.id ?? '');
    if (labels.length < 3) labels.push(block?.name || block?.id || '');
  }
  if (ids.length === 0) return null;
  return {
    kind: check.kind,
    severity: 'warning',
    blockIds: ids,
    message: `${groupLabel(ids.length, labels)}: ${check.detail}`,
  };
}

/** One reach check's components, the decoders' edges they were seeded from, and its finding. */
interface ReachResult {
  readonly check: ReachCheck;
  readonly edges: DecoderEdges | null;
  readonly reach: ReachComponents;
  readonly finding: Finding | null;
}

/** What the decoder-reach checks leave for the next edit. */
export interface DecoderReachState {
  readonly results: readonly ReachResult[];
}

/**
 * One reach check of the whole design: the seeds, which trees of the serving forest hold one, and the mats
 * in the others. The components block by block are labelled only when an edit asks for them.
 */
function reachResult(
  mats: MatTable,
  matIndexAt: Int32Array,
  check: ReachCheck,
  edges: DecoderEdges | null,
  seed: Uint8Array,
  forest: ServingForest,
): ReachResult {
  const reach = new ComponentsOnDemand(check.part, seed, mats, matIndexAt);
  const seededRoots = seededTrees(forest, check.part, seed);
  const finding = seededRoots === null ? null : unreachedInForest(mats, forest, check, seededRoots);
  return { check, edges, reach, finding };
}

/**
 * Per table position, 1 at the roots of the trees holding a seed; null when every tree holds one (then
 * every mat is reached). The seeds are found by the native search of the seed array: they are few.
 */
function seededTrees(forest: ServingForest, part: ServingPart, seed: Uint8Array): Uint8Array | null {
  const seededRoot = new Uint8Array(seed.length);
  let seeded = 0;
  for (let i = seed.indexOf(1); i >= 0; i = seed.indexOf(1, i + 1)) {
    const r = forest.rootOf(part, i);
    if (r < 0 || seededRoot[r] !== 0) continue;
    seededRoot[r] = 1;
    seeded++;
  }
  return seeded === forest.trees[part] ? null : seededRoot;
}

/** {@link unreachedFinding} with the reach read from the forest: a mat is reached when its root is seeded. */
function unreachedInForest(
  mats: MatTable,
  forest: ServingForest,
  check: ReachCheck,
  seededRoot: Uint8Array,
): Finding | null {
  const reached = new Uint8Array(mats.count);
  for (let k = 0; k < mats.count; k++)
    reached[k] = seededRoot[forest.rootOf(check.part, mats.position[k] as number)] as number;
  return unreachedFinding(mats, reached, check);
}

/**
 * Warnings for mats cut off from the decoders: word lines whose driver strips lead to no row decoder,
 * and bit lines whose sense-amplifier strips (the column path) lead to no column decoder.
 */
export function decoderReach(
  table: BlockTable,
  mats: MatTable,
  matIndexAt: Int32Array,
  forest: ServingForest = ServingForest.of(mats, table),
): DecoderReachState {
  const rows = REACH_CHECKS[0] as ReachCheck;
  const columns = REACH_CHECKS[1] as ReachCheck;
  const rowEdges = DecoderEdges.of(table, rows.decoderCode);
  const columnEdges = DecoderEdges.of(table, columns.decoderCode);
  const [rowSeeds, columnSeeds] = seedsOfChecks(table, matIndexAt, rows, rowEdges, columns, columnEdges);
  return {
    results: [
      reachResult(mats, matIndexAt, rows, rowEdges, rowSeeds, forest),
      reachResult(mats, matIndexAt, columns, columnEdges, columnSeeds, forest),
    ],
  };
}

export function decoderReachFindings(state: DecoderReachState): Finding[] {
  const findings: Finding[] = [];
  for (const r of state.results) if (r.finding) findings.push(r.finding);
  return findings;
}

/**
 * The checks after an edit in place (see {@link LayoutEdit}): components are labelled again only where
 * the edit touched them, and a finding is listed again only when a mat's standing changed or it names a
 * changed block; otherwise the previous finding is kept as it was. A moved decoder changes the seeds of
 * whatever it leaves or meets, so the check of its type is done again whole.
 */
export function decoderReachAfterEdit(
  previous: DecoderReachState,
  before: MatTable,
  table: BlockTable,
  mats: MatTable,
  edit: LayoutEdit,
): DecoderReachState {
  let forest: ServingForest | null = null;
  const results = previous.results.map((r) => {
    const { check, edges } = r;
    const full = () => {
      const edges = DecoderEdges.of(table, check.decoderCode);
      const seed = reachSeeds(table, edit.matIndexAt, edges, check.decoderCode, check.stripCode);
      forest ??= ServingForest.of(mats, table);
      return reachResult(mats, edit.matIndexAt, check, edges, seed, forest);
    };
    if (edit.changed.some((i) => table.type[i] === check.decoderCode)) return full();
    const next = reachComponentsAfterEdit(r.reach, before, mats, edit, (i) =>
      seedAt(table, edit.matIndexAt, edges, i, check.decoderCode, check.stripCode),
    );
    if (!next) return full();
    const { reach, relabelled } = next;
    const unreachedBefore = (i: number, k: number) =>
      !isReached(r.reach, i) && hasServing(before, k, check.part);
    const unreachedNow = (i: number, k: number) => !isReached(reach, i) && hasServing(mats, k, check.part);
    let same = true;
    for (const i of relabelled) {
      const k = edit.matIndexAt[i] as number;
      if (k >= 0 && unreachedBefore(i, k) !== unreachedNow(i, k)) {
        same = false;
        break;
      }
    }
    // A changed mat the finding names may have a new name.
    for (const i of edit.changed) {
      const k = edit.matIndexAt[i] as number;
      if (k >= 0 && unreachedNow(i, k)) same = false;
    }
    const finding = same ? r.finding : unreachedFinding(mats, reachedMats(reach, mats), check);
    return { check, edges, reach, finding };
  });
  return { results };
}
