import { BLOCK_TYPE_CODES } from '../../geometry/blockTable';
import type { BlockRuns } from '../../geometry/blockRuns';
import { someEdgeNearAStart } from './facingStrips';
import { UNSERVING } from './servingForest';

/*
 * The back-to-back check's shortcut for tiled arrays (backToBackStrips.ts), where a table lists each
 * strip type as one stretch of positions facing one way: native searches of the type and orientation
 * arrays find that stretch, and the table's runs show whether any two strips may face, so that the check
 * reads coordinates per run rather than strip by strip (in the interpreter every number read from a
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
 * Whether any strip among positions `from … to` (one stretch of a strip type, see {@link StripRange})
 * has its far edge within the tolerance of some strip's start: the answer facingStrips.ts's own test
 * gives for them, from the table's runs (geometry/blockRuns.ts) rather than strip by strip. Strips lying
 * across (`lying`) are measured top to bottom, and the strips of a run share their top and bottom edges:
 * one start and edge per run. Strips standing are measured left to right, and runs of one layout have the
 * same left edges and widths: the strips of one run per layout.
 */
export function mayFaceInRuns(
  runs: BlockRuns,
  x: Float64Array,
  width: Float64Array,
  from: number,
  to: number,
  lying: boolean,
): boolean {
  // Lying strips give one start per run.
  const size = lying ? runs.count : to + 1 - from;
  const starts = new Float64Array(size);
  const edges = new Float64Array(size);
  const seen = new Uint8Array(runs.layouts);
  let n = 0;
  // The run holding position `from` (runs cover the table in order; none spans two types).
  let lo = 0;
  let hi = runs.count - 1;
  while (lo < hi) {
    const mid = (lo + hi + 1) >>> 1;
    if ((runs.start[mid] as number) <= from) lo = mid;
    else hi = mid - 1;
  }
  for (let r = lo; r < runs.count && (runs.start[r] as number) <= to; r++) {
    if (lying) {
      starts[n] = runs.top[r] as number;
      edges[n++] = runs.bottom[r] as number;
      continue;
    }
    const layout = runs.layout[r] as number;
    if (seen[layout] === 1) continue;
    seen[layout] = 1;
    for (let i = runs.start[r] as number; i < (runs.start[r + 1] as number); i++) {
      starts[n] = x[i] as number;
      edges[n++] = (x[i] as number) + (width[i] as number);
    }
  }
  return someEdgeNearAStart(starts.subarray(0, n), edges.subarray(0, n));
}
