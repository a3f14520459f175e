import { servedFiguresKey } from './figureRecipes';
import {
  MAT_CODE,
  ROW_DECODER_CODE,
  SENSE_AMP_STRIP_CODE,
  WORDLINE_DRIVER_STRIP_CODE,
  type BlockTable,
  type MatKind,
} from '../../geometry/blockTable';
import { uncoveredLineCount } from '../../geometry/interval';
import type { NeighbourTable } from '../../geometry/neighbourRows';
import { ABUTMENT_TOLERANCE } from '../../geometry/rect';
import { emptyConnections, matConnections } from './connectivity';
import type { MatTableBuilder } from './matTable';
import { pairsAcrossStrips } from './openBitline';

/**
 * The connection pass of a whole die: matConnections (connectivity.ts) for every mat in one loop, with the same
 * arithmetic and the same answers (test/engine/servedLines.test.ts compares them on random floorplans).
 * Why a second form: evaluate()'s first call in a process runs almost wholly in V8's interpreter, where
 * the cost is the bytecodes executed per mat. This loop reads each mat's box once, tests each
 * neighbour's two facing sides together, calls no helper per neighbour, reads a kind's line facts from
 * typed arrays, and skips the line count of an edge its strips cover whole. Mats whose cell pairs bit
 * lines across strips (open bit lines) look beyond their strips and go through matConnections itself.
 */

/** Per mat kind, what the pass reads (read from the kinds once, not from a kind or cell per mat). */
export class KindLines {
  /** 1 when the kind's bit lines run vertically (its sense amplifiers sit on its top and bottom). */
  readonly vertical: Uint8Array;
  /** 1 when the kind's cell pairs bit lines across strips (openBitline.ts). */
  readonly open: Uint8Array;
  readonly bitlinePitch: Float64Array;
  readonly bitlineCount: Float64Array;
  readonly wordlinePitch: Float64Array;
  readonly wordlineCount: Float64Array;
  /** Length of the edge sense amplifiers serve (the word-line length, m). */
  readonly senseEdge: Float64Array;
  /** Length of the edge drivers serve (the bit-line length, m). */
  readonly driveEdge: Float64Array;
  /** senseEdge − tolerance: a covered part reaching this far leaves no line at the edge's end. */
  readonly senseEdgeReach: Float64Array;
  /** driveEdge − tolerance, likewise. */
  readonly driveEdgeReach: Float64Array;

  constructor(kinds: readonly MatKind[]) {
    const n = kinds.length;
    this.vertical = new Uint8Array(n);
    this.open = new Uint8Array(n);
    this.bitlinePitch = new Float64Array(n);
    this.bitlineCount = new Float64Array(n);
    this.wordlinePitch = new Float64Array(n);
    this.wordlineCount = new Float64Array(n);
    this.senseEdge = new Float64Array(n);
    this.driveEdge = new Float64Array(n);
    this.senseEdgeReach = new Float64Array(n);
    this.driveEdgeReach = new Float64Array(n);
    for (let k = 0; k < n; k++) {
      const kind = kinds[k] as MatKind;
      const g = kind.geometry;
      this.vertical[k] = kind.block.bitlineAxis === 'vertical' ? 1 : 0;
      this.open[k] = pairsAcrossStrips(kind.cell) ? 1 : 0;
      this.bitlinePitch[k] = g.bitlinePitch;
      this.bitlineCount[k] = g.bitlineCount;
      this.wordlinePitch[k] = g.wordlinePitch;
      this.wordlineCount[k] = g.wordlineCount;
      this.senseEdge[k] = g.wordlineLength;
      this.driveEdge[k] = g.bitlineLength;
      // The same subtraction uncoveredLineCount makes for its last gap.
      this.senseEdgeReach[k] = g.wordlineLength - ABUTMENT_TOLERANCE;
      this.driveEdgeReach[k] = g.bitlineLength - ABUTMENT_TOLERANCE;
    }
  }
}

/**
 * Every mat's connections, mat k (in design order of the mats) at a time: what matConnections (connectivity.ts)
 * returns for it, column-wise. Scratch columns reused from call to call (they never leave evaluate).
 */
export class ServedLines {
  count = 0;
  /** Design position of mat k. */
  position = new Int32Array(0);
  unsensedBitlines = new Float64Array(0);
  undrivenWordlines = new Float64Array(0);
  senseAmpEnds = new Uint8Array(0);
  unpartneredBitlines = new Float64Array(0);
  /**
   * The mat's figures key ({@link servedFiguresKey}) when it leaves no line unserved, else −1.
   */
  servedKey = new Int32Array(0);

  /** Room for `count` mats (contents stale). */
  reset(count: number): void {
    this.count = count;
    if (this.position.length >= count) return;
    this.position = new Int32Array(count);
    this.unsensedBitlines = new Float64Array(count);
    this.undrivenWordlines = new Float64Array(count);
    this.senseAmpEnds = new Uint8Array(count);
    this.unpartneredBitlines = new Float64Array(count);
    this.servedKey = new Int32Array(count);
  }
}

/** Contacts of one edge kind a mat may have in this pass; a mat with more goes through matConnections. */
const CONTACT_LIMIT = 16;
/** Scratch lists of one mat's contacts: spans (start, end pairs, m along the edge) and strips. */
const SENSE_SPANS = new Float64Array(2 * CONTACT_LIMIT);
const DRIVE_SPANS = new Float64Array(2 * CONTACT_LIMIT);
const SENSE_AMPS = new Int32Array(CONTACT_LIMIT);
const DRIVERS = new Int32Array(CONTACT_LIMIT);
/** −tolerance as a constant: negating in the pass would be an operation needing type feedback. */
const NEGATIVE_TOLERANCE = -ABUTMENT_TOLERANCE;
/** The record matConnections fills for a mat the pass hands it. */
const RECORD = emptyConnections();

/**
 * Mat k's connections from matConnections itself, into column k of `out` (for mats the pass does not
 * handle itself).
 */
function connectMatAlone(
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

/**
 * The connections of the mats among blocks `from` … `to` − 1, the first of them mat k (in design order
 * of the mats), into `out` and `serving`; returns the mat index after the last. `apart[0]` is then the
 * number of those mats whose answer read more than whether each strip meets and covers each edge
 * whole: mats handed to matConnections and mats with an edge not covered whole (whose line counts
 * read the spans).
 */
export function connectMatsIn(
  table: BlockTable,
  neighbours: NeighbourTable,
  kinds: KindLines,
  serving: MatTableBuilder,
  out: ServedLines,
  from: number,
  to: number,
  k: number,
  apart: Int32Array,
): number {
  return connectEachMat(
    table,
    neighbours,
    kinds,
    serving,
    out,
    from,
    to,
    k,
    apart,
    table.x,
    table.y,
    table.width,
    table.height,
    table.type,
    table.kindOf,
    neighbours.start,
    neighbours.end,
    neighbours.list,
    kinds.vertical,
    kinds.open,
    kinds.senseEdgeReach,
    kinds.driveEdgeReach,
    out.position,
    out.unsensedBitlines,
    out.undrivenWordlines,
    out.senseAmpEnds,
    out.unpartneredBitlines,
    out.servedKey,
    SENSE_SPANS,
    DRIVE_SPANS,
    SENSE_AMPS,
    DRIVERS,
  );
}

/**
 * The pass itself (the hot loop ends its function: DEVELOPERS.md). Per neighbour, as abutmentSpan has it:
 * a side meets when the facing edges lie within the tolerance; the stretch covered runs from
 * max(own start, its start) to min(own end, its end), measured from the side's start, and counts when
 * longer than the tolerance. Both sides of an axis share that stretch, so it is computed once.
 */
function connectEachMat(
  table: BlockTable,
  neighbours: NeighbourTable,
  kinds: KindLines,
  serving: MatTableBuilder,
  out: ServedLines,
  from: number,
  to: number,
  firstMat: number,
  apart: Int32Array,
  // What the loop reads, as arguments: code before the loop that read properties would have no type
  // feedback when V8 compiles the function after its first call (that call ran it before the function
  // had a feedback vector), and the compiled code would be thrown away at entry (see blockTable.ts,
  // writeRows).
  x: Float64Array,
  y: Float64Array,
  width: Float64Array,
  height: Float64Array,
  type: Uint8Array,
  kindOf: Int32Array,
  start: Int32Array,
  end: Int32Array,
  list: Int32Array,
  vertical: Uint8Array,
  open: Uint8Array,
  senseEdgeReach: Float64Array,
  driveEdgeReach: Float64Array,
  position: Int32Array,
  unsensedBitlines: Float64Array,
  undrivenWordlines: Float64Array,
  senseAmpEnds: Uint8Array,
  unpartneredBitlines: Float64Array,
  servedKey: Int32Array,
  // Scratch lists of CONTACT_LIMIT contacts.
  senseSpans: Float64Array,
  driveSpans: Float64Array,
  senseAmps: Int32Array,
  drivers: Int32Array,
): number {
  const tol = ABUTMENT_TOLERANCE;
  const negativeTol = NEGATIVE_TOLERANCE;
  let k = firstMat;
  let handed = 0;
  for (let at = from; at < to; at++) {
    if (type[at] !== MAT_CODE) continue;
    const kind = kindOf[at] as number;
    position[k] = at;
    if (open[kind] === 1) {
      connectMatAlone(table, at, neighbours, serving, k, out, true);
      handed++;
      k++;
      continue;
    }
    // Sense amplifiers serve the bit-line ends: top and bottom when the bit lines run vertically.
    const senseAcross = vertical[kind] === 1;
    const tx = x[at] as number;
    const ty = y[at] as number;
    const tr = tx + (width[at] as number);
    const tb = ty + (height[at] as number);
    let senseCount = 0;
    let driveCount = 0;
    let senseAmpCount = 0;
    let driverCount = 0;
    let first = 0;
    let second = 0;
    // For the covered-whole test below: whether some span starts beyond the tolerance, and whether one
    // reaches within the tolerance of the edge's end.
    let senseStartsLate = false;
    let senseReaches = false;
    let driveStartsLate = false;
    let driveReaches = false;
    let alone = false;
    const senseReach = senseEdgeReach[kind] as number;
    const driveReach = driveEdgeReach[kind] as number;
    const last = end[at] as number;
    for (let p = start[at] as number; p < last; p++) {
      const i = list[p] as number;
      const t = type[i] as number;
      const sense = t === SENSE_AMP_STRIP_CODE;
      if (!sense && t !== WORDLINE_DRIVER_STRIP_CODE && t !== ROW_DECODER_CODE) continue;
      const nx = x[i] as number;
      const ny = y[i] as number;
      const nr = nx + (width[i] as number);
      const nb = ny + (height[i] as number);
      let meetsFirst: boolean;
      let meetsSecond: boolean;
      let from: number;
      let to: number;
      if (sense === senseAcross) {
        // Top (its bottom on our top), then bottom; the stretch runs along x.
        const dFirst = nb - ty;
        const dSecond = ny - tb;
        meetsFirst = !(dFirst > tol || dFirst < negativeTol);
        meetsSecond = !(dSecond > tol || dSecond < negativeTol);
        if (!meetsFirst && !meetsSecond) continue;
        from = nx > tx ? nx - tx : 0;
        to = (nr < tr ? nr : tr) - tx;
      } else {
        // Left (its right on our left), then right; the stretch runs along y.
        const dFirst = nr - tx;
        const dSecond = nx - tr;
        meetsFirst = !(dFirst > tol || dFirst < negativeTol);
        meetsSecond = !(dSecond > tol || dSecond < negativeTol);
        if (!meetsFirst && !meetsSecond) continue;
        from = ny > ty ? ny - ty : 0;
        to = (nb < tb ? nb : tb) - ty;
      }
      if (!(to - from > tol)) continue;
      if (senseCount + 2 > CONTACT_LIMIT || driveCount + 2 > CONTACT_LIMIT) {
        alone = true;
        break;
      }
      if (sense) {
        if (from > tol) senseStartsLate = true;
        if (to >= senseReach) senseReaches = true;
        if (meetsFirst) {
          senseSpans[2 * senseCount] = from;
          senseSpans[2 * senseCount + 1] = to;
          senseCount++;
          first = 1;
          senseAmps[senseAmpCount++] = i;
        }
        if (meetsSecond) {
          senseSpans[2 * senseCount] = from;
          senseSpans[2 * senseCount + 1] = to;
          senseCount++;
          second = 1;
          senseAmps[senseAmpCount++] = i;
        }
      } else {
        if (from > tol) driveStartsLate = true;
        if (to >= driveReach) driveReaches = true;
        if (meetsFirst) {
          driveSpans[2 * driveCount] = from;
          driveSpans[2 * driveCount + 1] = to;
          driveCount++;
          drivers[driverCount++] = i;
        }
        if (meetsSecond) {
          driveSpans[2 * driveCount] = from;
          driveSpans[2 * driveCount + 1] = to;
          driveCount++;
          drivers[driverCount++] = i;
        }
      }
    }
    if (alone) {
      connectMatAlone(table, at, neighbours, serving, k, out, false);
      handed++;
      k++;
      continue;
    }
    serving.setServing(k, senseAmps, senseAmpCount, drivers, driverCount);
    // An edge whose spans all start within the tolerance of its start and one of which reaches within the
    // tolerance of its end is covered as one part: uncoveredLineCount would find no gap (sorted, every
    // span merges into the first part, which starts at most a tolerance in and ends at most one short).
    // Otherwise it counts.
    const senseWhole = senseCount > 0 && !senseStartsLate && senseReaches;
    const driveWhole = driveCount > 0 && !driveStartsLate && driveReaches;
    if (!senseWhole || !driveWhole) handed++;
    const unsensed = senseWhole
      ? 0
      : uncoveredLineCount(
          senseSpans,
          senseCount,
          kinds.senseEdge[kind] as number,
          tol,
          kinds.bitlinePitch[kind] as number,
          kinds.bitlineCount[kind] as number,
        );
    const undriven = driveWhole
      ? 0
      : uncoveredLineCount(
          driveSpans,
          driveCount,
          kinds.driveEdge[kind] as number,
          tol,
          kinds.wordlinePitch[kind] as number,
          kinds.wordlineCount[kind] as number,
        );
    unsensedBitlines[k] = unsensed;
    undrivenWordlines[k] = undriven;
    servedKey[k] = unsensed === 0 && undriven === 0 ? servedFiguresKey(kind, first + second) : -1;
    senseAmpEnds[k] = first + second;
    unpartneredBitlines[k] = 0;
    k++;
  }
  apart[0] = handed;
  return k;
}
