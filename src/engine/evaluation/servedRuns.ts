import {
  MAT_CODE,
  ROW_DECODER_CODE,
  SENSE_AMP_STRIP_CODE,
  WORDLINE_DRIVER_STRIP_CODE,
  type BlockTable,
} from '../../geometry/blockTable';
import type { BlockRuns } from '../../geometry/blockRuns';
import type { NeighbourTable } from '../../geometry/neighbourRows';
import type { RunCopies } from '../../geometry/runRows';
import { RunLists, type MatTableBuilder, type ServingLists } from './matTable';
import { runPairCode } from './runPairCode';
import { connectMatsIn, KindLines, ServedLines } from './servedLines';

/**
 * The connection pass of a whole die (servedLines.ts, connectMatsIn), run by run where the neighbour pass
 * cut the table into runs and copied rows (geometry/runRows.ts): a run of mats whose neighbour rows are
 * an earlier run's shifted copies (its model's) takes the model's answers instead of walking its mats.
 * Why: on evaluate()'s first call the pass runs in V8's interpreter, where its cost is the bytecodes run
 * per mat; a tiled array's rows of mats repeat, so one row is walked and the others copied with
 * TypedArray.set / copyWithin and one integer step per serving strip and offset.
 *
 * When the copy gives the walk's answer, to the bit: the walk decides a mat whose strips cover both edges
 * whole (the only mats a model may have) from its kind and, for each neighbour, its type, whether it meets
 * the mat's top / bottom / left / right edge within the tolerance and whether the stretch it shares starts
 * late, passes and reaches the edge's end. Neighbour j of the model's mat at lies, in the copy, at the same
 * place of the partner run that replaces j's run: runs of one layout have the same left edges and widths
 * at each place (blockRuns.ts), so every horizontal comparison reads the same doubles. Vertically a run's
 * blocks share top and bottom, so the vertical comparisons of a mat run and a strip run are one code per
 * pair of runs (runPairCode.ts), compared here for every strip partner. Mats of one kind (the model's and
 * the copy's) make the rest equal; serving strips come out shifted as the rows are.
 */

const LINES = new ServedLines();
/** What connectMatsIn leaves: how many mats of the blocks it walked a copy may not take. */
const APART = new Int32Array(1);

/**
 * Every mat's connections (mat k = the k-th mat in design order), with each mat's serving strips recorded
 * in `serving` as mat k. The returned columns are reused by the next call.
 */
export function connectAllMats(
  table: BlockTable,
  neighbours: NeighbourTable,
  matCount: number,
  serving: MatTableBuilder,
): ServedLines {
  LINES.reset(matCount);
  const kinds = new KindLines(table.kinds);
  const runs = neighbours.runs;
  const copies = neighbours.copies;
  if (runs && copies) connectRunMats(table, neighbours, runs, copies, kinds, serving, LINES);
  else connectMatsIn(table, neighbours, kinds, serving, LINES, 0, table.count, 0, APART);
  return LINES;
}

/** How a run walked as a model may be copied (found when a copy first asks). */
const UNKNOWN = 0;
const NOT_COPIED = 1;
/** Copied: the serving strips are taken through the partner shifts… */
const SHIFTED = 2;
/** …or, every mat's serving strips being its neighbour row in order, from the copy's own rows. */
const ROWS = 3;

/** What the pass keeps per run walked: where its mats and serving strips start and end, how it copies. */
class WalkedRuns {
  readonly firstMat: Int32Array;
  readonly firstServing: Int32Array;
  readonly lastServing: Int32Array;
  readonly copying: Uint8Array;
  /** Per run: what to add to a position in it to reach the same place in the copy's partner run. */
  readonly shift: Int32Array;
  /** Per partner entry of a model: its run pair's code (−1: not found yet). */
  readonly modelCodes: Int32Array;
  /** Per model: 1 when copies of it have regular lists (see RunLists) as it has. */
  readonly inherits: Uint8Array;
  /** Each block's run, once a copy shifts serving strips. */
  runOf: Int32Array | null = null;

  constructor(
    runs: number,
    partners: number,
    readonly lists: RunLists,
  ) {
    this.firstMat = new Int32Array(runs);
    this.firstServing = new Int32Array(runs);
    this.lastServing = new Int32Array(runs);
    // A run not walked on its own (its model another, or not a run of mats) is no model.
    this.copying = new Uint8Array(runs).fill(NOT_COPIED);
    this.shift = new Int32Array(runs);
    this.modelCodes = new Int32Array(partners).fill(-1);
    this.inherits = new Uint8Array(runs);
  }
}

function connectRunMats(
  table: BlockTable,
  neighbours: NeighbourTable,
  runs: BlockRuns,
  copies: RunCopies,
  kinds: KindLines,
  serving: MatTableBuilder,
  out: ServedLines,
): void {
  const { start, code } = runs;
  const model = copies.model;
  const walked = new WalkedRuns(runs.count, copies.partners.length, new RunLists(runs.count));
  serving.runLists = walked.lists;
  const lists = serving.serving;
  // Runs of mats that neither are a model nor copy one wait to be walked together: blocks `waiting` …
  // `waitingEnd` − 1 (blocks of other runs between them are passed over; none after the last).
  let waiting = -1;
  let waitingEnd = -1;
  let k = 0;
  for (let r = 0; r < runs.count; r++) {
    if (code[r] !== MAT_CODE) continue;
    const m = model[r] as number;
    const from = start[r] as number;
    const to = start[r + 1] as number;
    if (m !== r && !mayCopy(table, neighbours, runs, copies, kinds, walked, lists, r, m)) {
      if (waiting < 0) waiting = from;
      waitingEnd = to;
      continue;
    }
    if (waiting >= 0)
      k = connectMatsIn(table, neighbours, kinds, serving, out, waiting, waitingEnd, k, APART);
    waiting = -1;
    if (m === r) {
      walked.firstMat[r] = k;
      walked.firstServing[r] = lists.used;
      k = connectMatsIn(table, neighbours, kinds, serving, out, from, to, k, APART);
      walked.lastServing[r] = lists.used;
      walked.copying[r] = APART[0] === 0 ? UNKNOWN : NOT_COPIED;
    } else {
      copyRun(neighbours, runs, walked, lists, out, r, m, k);
      k += to - from;
    }
  }
  if (waiting >= 0) connectMatsIn(table, neighbours, kinds, serving, out, waiting, waitingEnd, k, APART);
}

/**
 * Whether run r may take model m's answers: m was walked with every mat decided by meets and whole
 * edges, both runs' mats are of one kind, and each partner of r is of the same type and run pair code as
 * m's partner in its place (and of its layout, see RunCopies). Leaves each partner's shift in `walked.shift`.
 */
function mayCopy(
  table: BlockTable,
  neighbours: NeighbourTable,
  runs: BlockRuns,
  copies: RunCopies,
  kinds: KindLines,
  walked: WalkedRuns,
  lists: ServingLists,
  r: number,
  m: number,
): boolean {
  const { start, code } = runs;
  if (walked.copying[m] === UNKNOWN)
    walked.copying[m] = modelCopying(table, neighbours, runs, copies, walked, lists, m);
  if (walked.copying[m] === NOT_COPIED) return false;
  const kind = table.kindOf[start[m] as number] as number;
  if (table.kinds.length > 1 && !oneKind(table.kindOf, kind, start[r] as number, start[r + 1] as number))
    return false;
  // The reach a left or right strip's stretch is measured against (see runPairCode).
  const reach = (
    kinds.vertical[kind] === 1 ? kinds.driveEdgeReach[kind] : kinds.senseEdgeReach[kind]
  ) as number;
  const { partners, partnersFrom } = copies;
  const at = partnersFrom[m] as number;
  const own = partnersFrom[r] as number;
  const count = (partnersFrom[m + 1] as number) - at;
  const codes = walked.modelCodes;
  for (let e = 0; e < count; e++) {
    const p = partners[at + e] as number;
    const q = partners[own + e] as number;
    const c = code[p] as number;
    if (code[q] !== c) return false;
    walked.shift[p] = (start[q] as number) - (start[p] as number);
    if (c !== SENSE_AMP_STRIP_CODE && c !== WORDLINE_DRIVER_STRIP_CODE && c !== ROW_DECODER_CODE) continue;
    if ((codes[at + e] as number) < 0) codes[at + e] = runPairCode(runs.top, runs.bottom, m, p, reach);
    if (runPairCode(runs.top, runs.bottom, r, q, reach) !== codes[at + e]) return false;
  }
  return true;
}

/** Whether kindOf[from … to − 1] are all `kind`. */
function oneKind(kindOf: Int32Array, kind: number, from: number, to: number): boolean {
  for (let i = from; i < to; i++) if (kindOf[i] !== kind) return false;
  return true;
}

/**
 * How the walked run m may be copied: not when its mats are of several kinds; from the copy's own rows
 * when each mat's serving strips are its neighbour row, in order (rows follow each other in the list, see
 * RunCopies); else through the partner shifts.
 */
function modelCopying(
  table: BlockTable,
  neighbours: NeighbourTable,
  runs: BlockRuns,
  copies: RunCopies,
  walked: WalkedRuns,
  lists: ServingLists,
  m: number,
): number {
  const from = runs.start[m] as number;
  const to = runs.start[m + 1] as number;
  if (!oneKind(table.kindOf, table.kindOf[from] as number, from, to)) return NOT_COPIED;
  const regular = regularLists(runs, copies, walked, lists, m);
  walked.lists.regular[m] = regular === 0 ? 0 : 1;
  walked.lists.firstMat[m] = walked.firstMat[m] as number;
  walked.inherits[m] = regular === 2 ? 1 : 0;
  const { start, end, list } = neighbours;
  const { positions, offsets } = lists;
  const firstMat = walked.firstMat[m] as number;
  for (let at = from; at < to; at++) {
    const k = firstMat + at - from;
    const row = start[at] as number;
    let p = offsets[3 * k] as number;
    if ((offsets[3 * k + 2] as number) - p !== (end[at] as number) - row) return SHIFTED;
    for (let q = row; q < (end[at] as number); q++, p++) if (positions[p] !== list[q]) return SHIFTED;
  }
  return ROWS;
}

/**
 * Whether walked run m's serving lists are regular (see RunLists): 1, or 2 when besides each strip of
 * its first mat and the one as many places on as the run has mats (less one) lie in one partner run, so
 * that a copy's lists, shifted per partner run, are regular too; 0 when they are not.
 */
function regularLists(
  runs: BlockRuns,
  copies: RunCopies,
  walked: WalkedRuns,
  lists: ServingLists,
  m: number,
): number {
  const { start } = runs;
  const { positions, offsets } = lists;
  const length = (start[m + 1] as number) - (start[m] as number);
  const first = walked.firstMat[m] as number;
  const base = offsets[3 * first] as number;
  const senseAmps = (offsets[3 * first + 1] as number) - base;
  const count = (offsets[3 * first + 2] as number) - base;
  for (let c = 1; c < length; c++) {
    const at = offsets[3 * (first + c)] as number;
    if ((offsets[3 * (first + c) + 1] as number) - at !== senseAmps) return 0;
    if ((offsets[3 * (first + c) + 2] as number) - at !== count) return 0;
    for (let s = 0; s < count; s++) if (positions[at + s] !== (positions[base + s] as number) + c) return 0;
  }
  const { partners, partnersFrom } = copies;
  for (let s = 0; s < count; s++) {
    const e = positions[base + s] as number;
    let inOne = false;
    for (let q = partnersFrom[m] as number; q < (partnersFrom[m + 1] as number); q++) {
      const p = partners[q] as number;
      if ((start[p] as number) <= e && e + length <= (start[p + 1] as number)) inOne = true;
    }
    if (!inOne) return 1;
  }
  return 2;
}

/** Run r's mats (the first of them mat k) as model m's, their serving strips after the used ones. */
function copyRun(
  neighbours: NeighbourTable,
  runs: BlockRuns,
  walked: WalkedRuns,
  lists: ServingLists,
  out: ServedLines,
  r: number,
  m: number,
  k: number,
): void {
  const from = runs.start[r] as number;
  const to = runs.start[r + 1] as number;
  const length = to - from;
  const firstMat = walked.firstMat[m] as number;
  walked.lists.regular[r] = walked.inherits[m] as number;
  walked.lists.firstMat[r] = k;
  out.unsensedBitlines.copyWithin(k, firstMat, firstMat + length);
  out.undrivenWordlines.copyWithin(k, firstMat, firstMat + length);
  out.senseAmpEnds.copyWithin(k, firstMat, firstMat + length);
  out.unpartneredBitlines.copyWithin(k, firstMat, firstMat + length);
  out.servedKey.copyWithin(k, firstMat, firstMat + length);
  const modelFrom = walked.firstServing[m] as number;
  const count = (walked.lastServing[m] as number) - modelFrom;
  const used = lists.used;
  const positions = lists.room(count);
  placeMats(out.position, lists.offsets, k, from, length, firstMat, used - modelFrom);
  const { start, list } = neighbours;
  if (walked.copying[m] === ROWS) {
    positions.set(list.subarray(start[from] as number, (start[from] as number) + count), used);
  } else {
    walked.runOf ??= runOfBlocks(runs);
    shiftTo(positions, walked.runOf, walked.shift, modelFrom, modelFrom + count, used - modelFrom);
  }
  lists.used = used + count;
}

/**
 * Mats k … k + length − 1 are the blocks from `from` on, and their serving offsets those of mats
 * `firstMat` … plus `add` (one loop: a loop of its own per column costs more in the interpreter).
 */
function placeMats(
  position: Int32Array,
  offsets: Int32Array,
  k: number,
  from: number,
  length: number,
  firstMat: number,
  add: number,
): void {
  for (let c = 0, q = 3 * k, p = 3 * firstMat; c < length; c++, q += 3, p += 3) {
    position[k + c] = from + c;
    offsets[q] = (offsets[p] as number) + add;
    offsets[q + 1] = (offsets[p + 1] as number) + add;
    offsets[q + 2] = (offsets[p + 2] as number) + add;
  }
}

/** Positions from … to − 1, each shifted by its run's shift, written `offset` further on. */
function shiftTo(
  positions: Int32Array,
  runOf: Int32Array,
  shift: Int32Array,
  from: number,
  to: number,
  offset: number,
): void {
  for (let q = from; q < to; q++) {
    const j = positions[q] as number;
    positions[q + offset] = j + (shift[runOf[j] as number] as number);
  }
}

/** Each block's run. */
function runOfBlocks(runs: BlockRuns): Int32Array {
  const runOf = new Int32Array(runs.start[runs.count] as number);
  for (let r = 0; r < runs.count; r++) runOf.fill(r, runs.start[r] as number, runs.start[r + 1] as number);
  return runOf;
}
