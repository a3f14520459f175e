import { BLOCK_TYPE_CODES } from '../../geometry/blockTable';
import { ABUTMENT_TOLERANCE } from '../../geometry/rect';
import { UNSERVING } from './servingForest';

/*
 * The back-to-back check's shortcut for tiled arrays (backToBackStrips.ts), where a table lists each
 * strip type as one stretch of positions facing one way: native searches of the type and orientation
 * arrays find that stretch, and two native sorts of its coordinates show that no two strips can face,
 * so that the check reads no coordinate strip by strip (in the interpreter every number read from a
 * Float64Array is a fresh heap object).
 */

/**
 * The positions `from … to` (inclusive, `to` = −1 when none) of the blocks of type `code` and their
 * orientation: the blocks between them are all of that type and all face one way (not UNSERVING), so
 * that they are exactly the serving strips of the type, ascending. Null when they are not.
 */
export class StripRange {
  constructor(
    readonly from: number,
    readonly to: number,
    readonly facing: number,
  ) {}

  static of(type: Uint8Array, facing: Uint8Array, code: number): StripRange | null {
    const from = type.indexOf(code);
    if (from < 0) return new StripRange(0, -1, UNSERVING);
    const to = type.lastIndexOf(code);
    const types = type.subarray(from, to + 1);
    for (let c = 0; c < BLOCK_TYPE_CODES.length; c++) if (c !== code && types.indexOf(c) >= 0) return null;
    const f = facing[from] as number;
    const faces = facing.subarray(from, to + 1);
    for (let g = 0; g < 3; g++) if (g !== f && faces.indexOf(g) >= 0) return null;
    return f === UNSERVING ? null : new StripRange(from, to, f);
  }
}

/**
 * False only when no strip among positions `from … to` can have its far edge (start + thickness across)
 * within the tolerance of another's start, which is what facingPairs (facingStrips.ts) looks for; true
 * when some may, and the caller searches. From the sorted starts and thicknesses: a pair needs two
 * distinct starts whose difference lies within the thinnest and thickest strip, widened by the tolerance
 * and by a margin for rounding (2⁻⁴⁰ of the largest magnitude, far above the few ulps the search's sums
 * can move). The distinct starts are found by galloping searches, so a tiled array's few rows cost a few
 * reads each.
 */
export function mayFaceInRange(
  across: Float64Array,
  thickness: Float64Array,
  from: number,
  to: number,
): boolean {
  const starts = across.slice(from, to + 1).sort();
  const sizes = thickness.slice(from, to + 1).sort();
  const n = starts.length;
  if (n < 2) return false;
  const lowest = starts[0] as number;
  const highest = starts[n - 1] as number;
  const thinnest = sizes[0] as number;
  const thickest = sizes[n - 1] as number;
  // NaN sorts last: a start or thickness that is not finite leaves the answer to the search.
  if (!Number.isFinite(lowest + highest + thinnest + thickest)) return true;
  const slack =
    ABUTMENT_TOLERANCE + (Math.max(Math.abs(lowest), Math.abs(highest)) + Math.abs(thickest)) * 2 ** -40;
  const nearest = thinnest - slack;
  const furthest = thickest + slack;
  if (!(nearest > 0)) return true;
  const distinct = distinctValues(starts);
  return someGapWithin(distinct, nearest, furthest);
}

/** The distinct values of an ascending array without NaN, found by galloping past each run of one value. */
function distinctValues(sorted: Float64Array): Float64Array {
  const distinct = new Float64Array(sorted.length);
  let k = 0;
  for (let at = 0; at < sorted.length;) {
    const value = sorted[at] as number;
    distinct[k++] = value;
    // Gallop: double the step while the value repeats, then halve back to the first larger value.
    let lo = at;
    let step = 1;
    while (lo + step < sorted.length && (sorted[lo + step] as number) <= value) {
      lo += step;
      step *= 2;
    }
    let hi = Math.min(lo + step, sorted.length);
    while (hi - lo > 1) {
      const mid = (lo + hi) >>> 1;
      if ((sorted[mid] as number) <= value) lo = mid;
      else hi = mid;
    }
    at = hi;
  }
  return distinct.subarray(0, k);
}

/** True when two of the ascending `values` differ by at least `nearest` and at most `furthest`. */
function someGapWithin(values: Float64Array, nearest: number, furthest: number): boolean {
  let b = 0;
  for (let a = 0; a < values.length; a++) {
    const base = values[a] as number;
    if (b <= a) b = a + 1;
    while (b < values.length && (values[b] as number) - base < nearest) b++;
    if (b === values.length) return false;
    if ((values[b] as number) - base <= furthest) return true;
  }
  return false;
}
