import { servedFiguresKey } from './figureRecipes';
import {
  MAT_CODE,
  ROW_DECODER_CODE,
  SENSE_AMP_STRIP_CODE,
  WORDLINE_DRIVER_STRIP_CODE,
  type BlockTable,
} from '../../geometry/blockTable';
import type { BlockRuns } from '../../geometry/blockRuns';
import type { NeighbourTable } from '../../geometry/neighbourRows';
import { ABUTMENT_TOLERANCE } from '../../geometry/rect';
import { emptyConnections, matConnections } from './connectivity';
import type { MatTableBuilder, ServingLists } from './matTable';
import type { ServedLines } from './servedLines';

/**
 * The connection pass (servedLines.ts, connectEachMat) for a floorplan the neighbour pass cut into runs
 * (geometry/blockRuns.ts): the same answers, with fewer numbers read and formed per mat. Why: on
 * evaluate()'s first call the pass runs in V8's interpreter, where every double read from a typed array
 * and every double result is a new heap number (~50 per mat in connectEachMat).
 *
 * Blocks of one run share their top edge and bottom (top + height, as every box test forms it), so what
 * a mat's box test reads vertically is one pair of numbers per run: whether a strip meets the mat's top
 * or bottom edge, and how far it shares the mat's height, are decided once per pair of runs (and mat
 * kind) and kept as a small code. What differs per pair is horizontal, and that depends only on the two
 * blocks' left edges and widths, which runs of one layout share place by place (blockRuns.ts): so it is
 * found once per layout and place of the mat (and of the strip) and read for every later row laid out
 * alike. A strip on the top or bottom edge at the mat's own layout and place shares the mat's width as
 * the mat measures it; any other is measured as connectEachMat measures it; whether a strip on the left
 * or right edge meets is connectEachMat's test, kept per pair of layouts and places. Every test is
 * connectEachMat's comparison on the same doubles. A mat whose strips do not cover both edges whole (the
 * only case that needs their spans), that meets more strips than the scratch lists hold, or whose cell
 * pairs bit lines across strips goes through matConnections itself.
 */

/** A run pair's code: the other run's bottom on the mats' top edge (within the tolerance)… */
const MEETS_FIRST = 1;
/** …its top on the mats' bottom edge. */
const MEETS_SECOND = 2;
/** A stretch code's bits: the stretch shared is longer than the tolerance… */
const PASSES = 1;
/** …it starts beyond the tolerance from the edge's start… */
const STARTS_LATE = 2;
/** …it reaches the edge's end within the tolerance. */
const REACHES = 4;
/** Where a run pair's code keeps the stretch code of the mats' height it shares. */
const STRETCH_SHIFT = 2;

const NEGATIVE_TOLERANCE = -ABUTMENT_TOLERANCE;
/** Contacts a mat may have on this path; a mat with more goes through matConnections. */
const CONTACTS = 16;
const SENSE_AMPS = new Int32Array(CONTACTS);
const DRIVERS = new Int32Array(CONTACTS);
/** What the pass returns besides a strip run: every mat done, or more room wanted in the serving list. */
const DONE = -1;
const ROOM = -2;
/** Where the pass resumes: the mat's design position, its index among the mats, serving positions used. */
const RESUME = new Int32Array(3);
/** The record matConnections fills for a mat of this path's. */
const RECORD = emptyConnections();

/** Per mat kind, what the pass reads (from the kinds once, not per mat). */
export interface RunKindLines {
  /** 1 when the kind's bit lines run vertically (its sense amplifiers on its top and bottom). */
  readonly vertical: Uint8Array;
  /** 1 when the kind's cell pairs bit lines across strips. */
  readonly open: Uint8Array;
  readonly senseEdgeReach: Float64Array;
  readonly driveEdgeReach: Float64Array;
}

/**
 * Mat k's connections from matConnections itself, into column k of `out` (the path for mats the passes
 * do not handle themselves).
 */
export function connectMatAlone(
  table: BlockTable,
  at: number,
  neighbours: NeighbourTable,
  serving: MatTableBuilder,
  k: number,
  out: ServedLines,
  open: boolean,
): void {
  const c = matConnections(table, at, neighbours, serving, k, RECORD, open);
  out.unsensedBitlines[k] = c.unsensedBitlines;
  out.undrivenWordlines[k] = c.undrivenWordlines;
  out.senseAmpEnds[k] = c.senseAmpEnds;
  out.unpartneredBitlines[k] = c.unpartneredBitlines;
  out.servedKey[k] =
    c.unsensedBitlines === 0 && c.undrivenWordlines === 0 && c.unpartneredBitlines === 0
      ? servedFiguresKey(table.kindOf[at] as number, c.senseAmpEnds)
      : -1;
}

/** The connections of every mat, as connectEachMat finds them, for a table cut into `runs`. */
export function connectRunMats(
  table: BlockTable,
  neighbours: NeighbourTable,
  runs: BlockRuns,
  kinds: RunKindLines,
  serving: MatTableBuilder,
  out: ServedLines,
): void {
  // Each block's run, and each run's shift to the run that starts its layout: a block's place i + shift
  // names its layout and place (same layout and place, same left edge and width to the bit, see
  // blockRuns.ts), so what depends only on those is found once per layout and place.
  const runOf = new Int32Array(table.count);
  const shiftOf = new Int32Array(runs.count);
  const layoutStart = new Int32Array(runs.layouts).fill(-1);
  for (let r = 0; r < runs.count; r++) {
    const from = runs.start[r] as number;
    runOf.fill(r, from, runs.start[r + 1]);
    const layout = runs.layout[r] as number;
    if ((layoutStart[layout] as number) < 0) layoutStart[layout] = from;
    shiftOf[r] = (layoutStart[layout] as number) - from;
  }
  // The stretch reach of each kind's top/bottom strips and of its left/right strips: sense amplifiers
  // sit on the bit-line ends (top and bottom when the bit lines run vertically), drivers on the others.
  const n = kinds.vertical.length;
  const acrossReach = new Float64Array(n);
  const alongReach = new Float64Array(n);
  for (let k = 0; k < n; k++) {
    const vertical = kinds.vertical[k] === 1;
    acrossReach[k] = (vertical ? kinds.senseEdgeReach[k] : kinds.driveEdgeReach[k]) as number;
    alongReach[k] = (vertical ? kinds.driveEdgeReach[k] : kinds.senseEdgeReach[k]) as number;
  }
  const runOfPair = new Int32Array(runs.count).fill(-1);
  const kindOfPair = new Int32Array(runs.count);
  const pairCode = new Uint8Array(runs.count);
  // Per mat layout and place: the stretch code of a top/bottom strip laid out like the mat (for the kind
  // it was found for), and the meets code of up to two left/right strips (by their layout and place).
  const ownKind = new Int32Array(table.count).fill(-1);
  const ownCode = new Uint8Array(table.count);
  const sideStrips = new Int32Array(2 * table.count).fill(-1);
  const sideCodes = new Uint8Array(2 * table.count);
  const lists = serving.serving;
  const resume = RESUME;
  resume[0] = 0;
  resume[1] = 0;
  resume[2] = lists.used;
  // The pass stops at a mat whose strip run has no code for the mat's run and kind yet, and starts that
  // mat again once the code is here: the code's arithmetic stays out of the pass's compiled loop.
  for (;;) {
    const missing = connectEachRunMat(
      table,
      neighbours,
      serving,
      out,
      resume,
      table.count,
      table.x,
      table.width,
      table.type,
      table.kindOf,
      neighbours.start,
      neighbours.end,
      neighbours.list,
      runOf,
      shiftOf,
      ownKind,
      ownCode,
      sideStrips,
      sideCodes,
      runOfPair,
      kindOfPair,
      pairCode,
      kinds.vertical,
      kinds.open,
      acrossReach,
      out.position,
      out.unsensedBitlines,
      out.undrivenWordlines,
      out.senseAmpEnds,
      out.unpartneredBitlines,
      out.servedKey,
      lists,
      lists.room(2 * CONTACTS),
      lists.offsets,
      SENSE_AMPS,
      DRIVERS,
    );
    lists.used = resume[2] as number;
    if (missing === DONE) return;
    if (missing === ROOM) continue;
    const at = resume[0] as number;
    const run = runOf[at] as number;
    const kind = table.kindOf[at] as number;
    pairCode[missing] = runPairCode(runs.top, runs.bottom, run, missing, alongReach[kind] as number);
    runOfPair[missing] = run;
    kindOfPair[missing] = kind;
  }
}

/**
 * How a strip spanning `from` … `to` along an edge of a mat spanning `start` … `end` (m) covers it, as
 * connectEachMat measures it: the stretch shared runs from max(own start, its start) to min(own end,
 * its end), from the edge's start; bits PASSES, STARTS_LATE, REACHES (against `reach`, the edge's
 * length less the tolerance).
 */
function stretchCode(start: number, end: number, from: number, to: number, reach: number): number {
  const shareFrom = from > start ? from - start : 0;
  const shareTo = (to < end ? to : end) - start;
  const tol = ABUTMENT_TOLERANCE;
  return (
    (shareTo - shareFrom > tol ? PASSES : 0) |
    (shareFrom > tol ? STARTS_LATE : 0) |
    (shareTo >= reach ? REACHES : 0)
  );
}

/**
 * What run `s` is to the mats of run `r`: MEETS_FIRST / MEETS_SECOND when its bottom lies on their top
 * or its top on their bottom (within the tolerance), and the stretch code of their height it shares
 * (against `reach`), shifted by STRETCH_SHIFT.
 */
function runPairCode(top: Float64Array, bottom: Float64Array, r: number, s: number, reach: number): number {
  const ownTop = top[r] as number;
  const ownBottom = bottom[r] as number;
  const otherTop = top[s] as number;
  const otherBottom = bottom[s] as number;
  const dFirst = otherBottom - ownTop;
  const dSecond = otherTop - ownBottom;
  const tol = ABUTMENT_TOLERANCE;
  return (
    (dFirst > tol || dFirst < NEGATIVE_TOLERANCE ? 0 : MEETS_FIRST) |
    (dSecond > tol || dSecond < NEGATIVE_TOLERANCE ? 0 : MEETS_SECOND) |
    (stretchCode(ownTop, ownBottom, otherTop, otherBottom, reach) << STRETCH_SHIFT)
  );
}

/**
 * The pass itself, from the mat at `resume` (design position, mat index, serving positions used) on:
 * returns DONE when every mat is done, ROOM when the serving list needs room for the mat at `resume` (now
 * holding where it stopped), or a strip run whose code that mat wants for its run and kind. Serving strips go straight into `positions` and `offsets` (the
 * builder's ServingLists, with room for one mat's contacts); a mat that goes through matConnections
 * writes them through the builder. What the loop reads comes in as arguments (see blockTable.ts,
 * writeRows), and its exits share the code after it (run many times before V8 compiles the function).
 */
function connectEachRunMat(
  table: BlockTable,
  neighbours: NeighbourTable,
  serving: MatTableBuilder,
  out: ServedLines,
  resume: Int32Array,
  blockCount: number,
  x: Float64Array,
  width: Float64Array,
  type: Uint8Array,
  kindOf: Int32Array,
  start: Int32Array,
  end: Int32Array,
  list: Int32Array,
  runOf: Int32Array,
  /** Per run, what to add to a block's position to name its layout and place (see connectRunMats). */
  shiftOf: Int32Array,
  /** Per mat layout and place: the kind `ownCode` holds a code for (−1: none) and that code. */
  ownKind: Int32Array,
  ownCode: Uint8Array,
  /** Per mat layout and place, two slots: a left/right strip's layout and place (−1: none), its meets code. */
  sideStrips: Int32Array,
  sideCodes: Uint8Array,
  /** Per run, the mat run and kind its code in `pairCode` holds for (−1: none yet). */
  runOfPair: Int32Array,
  kindOfPair: Int32Array,
  pairCode: Uint8Array,
  vertical: Uint8Array,
  open: Uint8Array,
  acrossReach: Float64Array,
  position: Int32Array,
  unsensedBitlines: Float64Array,
  undrivenWordlines: Float64Array,
  senseAmpEnds: Uint8Array,
  unpartneredBitlines: Float64Array,
  servedKey: Int32Array,
  lists: ServingLists,
  positions: Int32Array,
  offsets: Int32Array,
  senseAmps: Int32Array,
  drivers: Int32Array,
): number {
  const tol = ABUTMENT_TOLERANCE;
  const negativeTol = NEGATIVE_TOLERANCE;
  // The kind whose reach for a top or bottom strip's stretch is at hand.
  let reachKind = -1;
  let kindAcrossReach = 0;
  let used = resume[2] as number;
  let missing = DONE;
  let at = resume[0] as number;
  let k = resume[1] as number;
  mats: for (; at < blockCount; at++) {
    if (type[at] !== MAT_CODE) continue;
    // Room for this mat's contacts, or back to the caller for it (growing the list here would be code
    // that runs only near the end of a die, after V8 compiled the loop without it).
    if (used + 2 * CONTACTS > positions.length) {
      missing = ROOM;
      break;
    }
    const kind = kindOf[at] as number;
    position[k] = at;
    if (open[kind] === 1) {
      lists.used = used;
      connectMatAlone(table, at, neighbours, serving, k, out, true);
      used = lists.used;
      positions = lists.positions;
      k++;
      continue;
    }
    const run = runOf[at] as number;
    if (kind !== reachKind) {
      reachKind = kind;
      kindAcrossReach = acrossReach[kind] as number;
    }
    const senseAcross = vertical[kind] === 1;
    // The mat's layout and place; its left and right edges are read when a code is not known yet.
    const slot = at + (shiftOf[run] as number);
    let tx = 0;
    let tr = 0;
    let edgesRead = false;
    let senseAmpCount = 0;
    let driverCount = 0;
    let first = 0;
    let second = 0;
    let senseStartsLate = false;
    let senseReaches = false;
    let driveStartsLate = false;
    let driveReaches = false;
    let alone = false;
    const last = end[at] as number;
    for (let p = start[at] as number; p < last; p++) {
      const i = list[p] as number;
      const t = type[i] as number;
      const sense = t === SENSE_AMP_STRIP_CODE;
      if (!sense && t !== WORDLINE_DRIVER_STRIP_CODE && t !== ROW_DECODER_CODE) continue;
      const s = runOf[i] as number;
      if (runOfPair[s] !== run || kindOfPair[s] !== kind) {
        missing = s;
        break mats;
      }
      const code = pairCode[s] as number;
      let meets: number;
      let stretch: number;
      // The strip's layout and place. A code not known yet for it needs the mat's left and right edges,
      // read at this one place (a read first reached on a later row would have no type feedback in the
      // code V8 compiled during the first).
      const across = sense === senseAcross;
      const place = i + (shiftOf[s] as number);
      let found = 2 * slot;
      const known = across
        ? place === slot && ownKind[slot] === kind
        : sideStrips[found] === place || sideStrips[++found] === place;
      if (!known && !edgesRead) {
        tx = x[at] as number;
        tr = tx + (width[at] as number);
        edgesRead = true;
      }
      if (across) {
        // On the top or bottom edge (decided per run pair); the stretch runs along x.
        meets = code & (MEETS_FIRST | MEETS_SECOND);
        if (meets === 0) continue;
        if (place === slot) {
          // Laid out like the mat: its stretch is the mat's own width as the mat measures it.
          if (!known) {
            ownCode[slot] = stretchCode(tx, tr, tx, tr, kindAcrossReach);
            ownKind[slot] = kind;
          }
          stretch = ownCode[slot] as number;
        } else {
          const left = x[i] as number;
          stretch = stretchCode(tx, tr, left, left + (width[i] as number), kindAcrossReach);
        }
      } else {
        // On the left (its right on our left) or right edge: meets as the two layouts and places have
        // it; the stretch runs along y (per run pair).
        if (!known) {
          const left = x[i] as number;
          const dFirst = left + (width[i] as number) - tx;
          const dSecond = left - tr;
          found = sideStrips[2 * slot] === -1 ? 2 * slot : 2 * slot + 1;
          sideStrips[found] = place;
          sideCodes[found] =
            (dFirst > tol || dFirst < negativeTol ? 0 : MEETS_FIRST) |
            (dSecond > tol || dSecond < negativeTol ? 0 : MEETS_SECOND);
        }
        meets = sideCodes[found] as number;
        if (meets === 0) continue;
        stretch = code >> STRETCH_SHIFT;
      }
      if ((stretch & PASSES) === 0) continue;
      if (senseAmpCount + driverCount + 2 > CONTACTS) {
        alone = true;
        break;
      }
      if (sense) {
        if ((stretch & STARTS_LATE) !== 0) senseStartsLate = true;
        if ((stretch & REACHES) !== 0) senseReaches = true;
        if ((meets & MEETS_FIRST) !== 0) {
          senseAmps[senseAmpCount++] = i;
          first = 1;
        }
        if ((meets & MEETS_SECOND) !== 0) {
          senseAmps[senseAmpCount++] = i;
          second = 1;
        }
      } else {
        if ((stretch & STARTS_LATE) !== 0) driveStartsLate = true;
        if ((stretch & REACHES) !== 0) driveReaches = true;
        if ((meets & MEETS_FIRST) !== 0) drivers[driverCount++] = i;
        if ((meets & MEETS_SECOND) !== 0) drivers[driverCount++] = i;
      }
    }
    // Both edges covered as one part each (see connectEachMat): no line left unserved. Otherwise the
    // spans are wanted, and matConnections finds them.
    if (
      alone ||
      senseAmpCount === 0 ||
      senseStartsLate ||
      !senseReaches ||
      driverCount === 0 ||
      driveStartsLate ||
      !driveReaches
    ) {
      lists.used = used;
      connectMatAlone(table, at, neighbours, serving, k, out, false);
      used = lists.used;
      positions = lists.positions;
    } else {
      // The serving strips as ServingLists.set writes them (room for them was made before).
      offsets[3 * k] = used;
      for (let c = 0; c < senseAmpCount; c++) positions[used++] = senseAmps[c] as number;
      offsets[3 * k + 1] = used;
      for (let c = 0; c < driverCount; c++) positions[used++] = drivers[c] as number;
      offsets[3 * k + 2] = used;
      unsensedBitlines[k] = 0;
      undrivenWordlines[k] = 0;
      servedKey[k] = servedFiguresKey(kind, first + second);
      senseAmpEnds[k] = first + second;
      unpartneredBitlines[k] = 0;
    }
    k++;
  }
  resume[0] = at;
  resume[1] = k;
  resume[2] = used;
  return missing;
}
